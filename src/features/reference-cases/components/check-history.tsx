/** The history of CI checks: newest first, status, commit, when, and what drifted. */
import type { CheckRecord } from '@/lib/api-types';
import { fmtWhen, shortCommit } from '@/lib/format';
import { CheckPill } from '@/components/status-pill';
import { TD, TH } from '@/components/ui';

interface FigureOff { figure?: string; path?: string; message?: string; difference?: number; allowed?: number }

function one(f: FigureOff): string {
  const what = f.figure ?? f.path ?? '';
  if (f.message) return `${what} ${f.message}`.trim();
  const off = f.difference !== undefined ? ` off by ${f.difference.toPrecision(3)}` : '';
  return `${what}${off}${f.allowed !== undefined ? ` (allowed ${f.allowed.toPrecision(3)})` : ''}`;
}

/** What a check found, in one line: figures out of tolerance (figure, difference, allowed) or the problems. */
export function detailsText(d: unknown, status = 'drift'): string {
  if (d === null || d === undefined) return '';
  if (typeof d === 'string') return d;
  if (Array.isArray(d)) {
    if (!d.length) return '';
    const what = status === 'drift' ? `figure${d.length === 1 ? '' : 's'} out of tolerance` : `problem${d.length === 1 ? '' : 's'}`;
    return `${d.length} ${what}: ${one(d[0] as FigureOff)}${d.length > 1 ? '; …' : ''}`;
  }
  const o = d as { worst?: { figure?: string; difference?: number; allowed?: number }; failures?: unknown[]; message?: string };
  if (o.message) return o.message;
  if (o.worst?.figure) {
    const n = Array.isArray(o.failures) ? `${o.failures.length} out of tolerance; ` : '';
    return `${n}worst ${o.worst.figure}${o.worst.difference !== undefined ? ` off by ${o.worst.difference.toPrecision(3)}` : ''}${o.worst.allowed !== undefined ? ` (allowed ${o.worst.allowed.toPrecision(3)})` : ''}`;
  }
  return JSON.stringify(d).slice(0, 160);
}

export function CheckHistory({ checks, showCase }: { checks: readonly CheckRecord[]; showCase: boolean }) {
  if (!checks.length) return <p className="m-0 px-3 py-2 text-xs text-ink-2">No checks recorded yet: CI records one per case with <span className="num">panelpoint check --push</span>.</p>;
  const sorted = [...checks].sort((a, b) => b.createdAt.localeCompare(a.createdAt));
  const counts: Record<string, number> = { pass: 0, drift: 0, invalid: 0, error: 0 };
  for (const c of checks) counts[c.status] = (counts[c.status] ?? 0) + 1;
  return (
    <>
      <p className="num m-0 px-3 pt-1.5 text-xs text-ink-2"><span className="text-ok">{counts.pass} pass</span> · <span className="text-warn">{counts.drift} drift</span> · <span className="text-bad">{counts.invalid} invalid</span>{counts.error ? <> · <span className="text-bad">{counts.error} error</span></> : null}</p>
      <table className="w-full border-collapse text-xs">
        <caption className="sr-only">Checks, newest first</caption>
        <thead><tr className="border-b border-rule">
          <th scope="col" className={TH}>When</th>
          {showCase && <th scope="col" className={TH}>Case</th>}
          <th scope="col" className={TH}>Result</th>
          <th scope="col" className={TH}>Commit</th>
          <th scope="col" className={TH}>By</th>
          <th scope="col" className={TH}>Details</th>
        </tr></thead>
        <tbody>
          {sorted.map((c, i) => (
            <tr key={c.id ?? i} data-check={c.status} className="border-b border-rule/60">
              <td className={`${TD} num whitespace-nowrap text-ink-2`}>{fmtWhen(c.createdAt)}</td>
              {showCase && <td className={TD}>{c.caseName}</td>}
              <td className={TD}><CheckPill status={c.status} /></td>
              <td className={`${TD} num text-ink-2`} title={c.gitCommit ?? ''}>{shortCommit(c.gitCommit)}</td>
              <td className={`${TD} whitespace-nowrap text-ink-2`}>{c.pushedBy?.name ?? '—'}</td>
              <td className={`${TD} num text-ink-2`}>{detailsText(c.details, c.status)}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </>
  );
}
