/** What the point chart drew and what it could not, in words beside it, with the cautions. */
import type { ReactNode } from 'react';
import { CautionLine } from '@/components/caution-line';
import { fmtCount } from '@/lib/format';
import { KIND_LABEL, KINDS, type PointKind } from '../lib/point-kinds';

const GLYPH: Record<PointKind, string> = { determinate: '●', indeterminate: '●', unstable: '×', critical: '◇', error: '▽' };
const TONE: Record<PointKind, string> = { determinate: 'text-ok', indeterminate: 'text-note', unstable: 'text-bad', critical: 'text-bad', error: 'text-warn' };

export function KindCounts({ counts, label }: { counts: Record<PointKind, number>; label: string }) {
  const present = KINDS.filter((k) => counts[k] > 0);
  if (!present.length) return null;
  return (
    <div>
      <p className="m-0 text-ink-2">{label}</p>
      <ul className="m-0 list-none p-0">
        {present.map((k) => (
          <li key={k} className="flex gap-2">
            <span aria-hidden="true" className={`num w-3 ${TONE[k]}`}>{GLYPH[k]}</span>
            <span className="flex-1">{KIND_LABEL[k]}</span>
            <span className="num">{fmtCount(counts[k])}</span>
          </li>
        ))}
      </ul>
    </div>
  );
}

export function ChartAside({ children, cautions }: { children: ReactNode; cautions?: readonly string[] }) {
  return (
    <aside aria-label="About this chart" className="flex flex-col gap-2 border-t border-rule px-3 py-2 text-xs xl:border-t-0 xl:border-l">
      {children}
      <CautionLine more={cautions} />
    </aside>
  );
}
