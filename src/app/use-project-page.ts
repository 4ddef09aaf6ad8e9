/** What every project page needs: the slug, the project with the caller's rights, who the caller is; remembers the project. */
import { useEffect } from 'react';
import { useParams } from 'react-router-dom';
import { useProject } from '@/features/projects/api/get-projects';
import { useMe } from '@/features/auth/api/get-me';
import { rememberProject } from '@/lib/current-project';

export function useProjectPage() {
  const { slug = '' } = useParams();
  const project = useProject(slug);
  const me = useMe();
  useEffect(() => {
    if (project.isSuccess) rememberProject(slug);
  }, [project.isSuccess, slug]);
  return { slug, project, me, rights: project.data?.rights ?? [], meId: me.data?.user.id };
}
