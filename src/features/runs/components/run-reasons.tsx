/** Why variants of a run are unstable or failed (the summary's distinct reasons), each with a count and its first example. */
import { Link } from 'react-router-dom';
import type { RunDetail } from '@/lib/run-types';
import { fmtCount } from '@/lib/format';
import { variantPath } from '@/lib/paths';
import { StatusPill } from '@/components/status-pill';
import { LINK } from '@/components/ui';

export function RunReasons({ slug, run }: { slug: string; run: RunDetail }) {
  const reasons = run.summary?.reasons ?? [];
  if (!reasons.length) return null;
  const top = [...reasons].sort((a, b) => b.count - a.count).slice(0, 6);
  return (
    <details className="rounded border border-rule bg-sheet px-3 py-1.5 text-xs">
      <summary className="cursor-pointer text-ink-2">
        Why variants are unstable or failed: <span className="num">{reasons.length}</span> distinct reason{reasons.length === 1 ? '' : 's'}
      </summary>
      <ul className="m-0 mt-1 list-none p-0">
        {top.map((r) => (
          <li key={r.status + r.reason} className="flex items-baseline gap-2 border-t border-rule/60 py-1">
            <span className="num w-16 shrink-0 text-right">{fmtCount(r.count)}</span>
            <StatusPill status={r.status as 'unstable' | 'error'} />
            <span className="flex-1 text-ink">{r.reason}</span>
            <Link to={variantPath(slug, run.runId, r.example.index)} className={`num shrink-0 ${LINK}`}>e.g. variant {r.example.index}</Link>
          </li>
        ))}
      </ul>
    </details>
  );
}
