/** The project picker of the top bar: keeps the section (tokens, uploads…) when switching projects. */
import { useId } from 'react';
import { useLocation, useNavigate } from 'react-router-dom';
import { useProjects } from '../api/get-projects';

const SECTIONS = new Set(['reference-cases', 'uploads', 'tokens']);

/** Where to go in project `next` from `path` (inside project `current`, or elsewhere). */
export function switchedPath(path: string, next: string): string {
  const m = /^\/projects\/[^/]+\/([^/]+)/.exec(path);
  return m && SECTIONS.has(m[1]) ? `/projects/${next}/${m[1]}` : `/projects/${next}`;
}

/** `current`: the project of the address, else the one last used (shown, not navigated to). */
export function ProjectSwitcher({ current }: { current?: string }) {
  const id = useId();
  const q = useProjects();
  const navigate = useNavigate();
  const { pathname } = useLocation();
  if (!q.data?.length) return null;
  return (
    <div className="flex items-center gap-1.5 text-xs text-white/70">
      <label htmlFor={id}>Project</label>
      <select id={id} value={current ?? ''} onChange={(e) => e.target.value && navigate(switchedPath(pathname, e.target.value))}
        className="max-w-[14rem] rounded border border-white/25 bg-bar px-1.5 py-0.5 text-xs text-white">
        {!current && <option value="">choose…</option>}
        {q.data.map((p) => <option key={p.slug} value={p.slug}>{p.name}</option>)}
      </select>
    </div>
  );
}
