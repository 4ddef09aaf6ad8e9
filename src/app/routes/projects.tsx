import { ProjectList } from '@/features/projects/components/project-list';

export function ProjectsPage() {
  return (
    <section aria-labelledby="projects-h" className="max-w-5xl">
      <h1 id="projects-h" className="mt-0 mb-3 text-lg font-semibold">Projects</h1>
      <ProjectList />
    </section>
  );
}
