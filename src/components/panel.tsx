/** The house panel: a sheet with a small uppercase heading, an optional count and actions on the right. */
import { useId, type ReactNode } from 'react';

interface Props {
  title: string;
  count?: number | string;
  actions?: ReactNode;
  children: ReactNode;
  className?: string;
  /** A name (a study, a case) rather than a section heading: not in capitals. */
  plain?: boolean;
}

export function Panel({ title, count, actions, children, className = '', plain = false }: Props) {
  const id = useId();
  return (
    <section aria-labelledby={id} className={`rounded border border-rule bg-sheet ${className}`}>
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1 border-b border-rule px-3 py-1.5">
        <h2 id={id} className={plain ? 'm-0 text-sm font-semibold text-ink' : 'm-0 text-xs font-semibold uppercase tracking-wide text-ink-2'}>
          {title}{count !== undefined && <span className="num ml-1 font-normal">({count})</span>}
        </h2>
        {actions && <div className="ml-auto flex flex-wrap items-center gap-2 text-xs">{actions}</div>}
      </div>
      {children}
    </section>
  );
}

/** The title block of a page: where it is (links), the title, a line of facts and actions. */
export function PageHeader({ context, title, facts, actions }: { context?: ReactNode; title: ReactNode; facts?: ReactNode; actions?: ReactNode }) {
  return (
    <header className="mb-3 flex flex-wrap items-end gap-x-6 gap-y-2">
      <div className="min-w-0 flex-1">
        {context && <div className="text-xs text-ink-3">{context}</div>}
        <h1 className="m-0 text-lg font-semibold text-ink">{title}</h1>
        {facts && <div className="mt-0.5 flex flex-wrap gap-x-4 text-xs text-ink-2">{facts}</div>}
      </div>
      {actions && <div className="flex flex-wrap items-center gap-2">{actions}</div>}
    </header>
  );
}
