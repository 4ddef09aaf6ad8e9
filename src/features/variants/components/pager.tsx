/** Paging of the table: first, previous, page n of m, next, last, and the page size. */
import { useId } from 'react';
import { fmtCount } from '@/lib/format';
import { BTN, FIELD } from '@/components/ui';

const SIZES = [25, 50, 100, 200, 500];

interface Props {
  page: number;
  pageSize: number;
  total: number;
  onPage: (p: number) => void;
  onSize: (s: number) => void;
}

export function Pager({ page, pageSize, total, onPage, onSize }: Props) {
  const id = useId();
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const from = total ? (page - 1) * pageSize + 1 : 0;
  const to = Math.min(total, page * pageSize);
  return (
    <nav aria-label="Pages of variants" className="flex flex-wrap items-center gap-2 px-3 py-1.5 text-xs text-ink-2">
      <span className="num">{fmtCount(from)}–{fmtCount(to)} of {fmtCount(total)}</span>
      <span className="ml-auto inline-flex items-center gap-1">
        <button type="button" className={BTN} disabled={page <= 1} onClick={() => onPage(1)} aria-label="First page">«</button>
        <button type="button" className={BTN} disabled={page <= 1} onClick={() => onPage(page - 1)}>Previous</button>
        <span className="num px-1">page {fmtCount(page)} of {fmtCount(pages)}</span>
        <button type="button" className={BTN} disabled={page >= pages} onClick={() => onPage(page + 1)}>Next</button>
        <button type="button" className={BTN} disabled={page >= pages} onClick={() => onPage(pages)} aria-label="Last page">»</button>
      </span>
      <label htmlFor={id}>Rows</label>
      <select id={id} value={pageSize} onChange={(e) => onSize(Number(e.target.value))} className={`num ${FIELD}`}>
        {SIZES.map((s) => <option key={s} value={s}>{s}</option>)}
      </select>
    </nav>
  );
}
