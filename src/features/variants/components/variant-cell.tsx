/** One cell of the variants table: figures in mono with 4 significant digits, members beside peaks. */
import type { VariantRow } from '@/lib/run-types';
import { fmt, fmtPlain } from '@/lib/format';
import { StatusPill } from '@/components/status-pill';
import type { Column } from '../lib/columns';

export function cellText(c: Column, r: VariantRow): string {
  if (c.group === 'param') return fmtPlain(r.params[c.key.slice(6)]);
  const v = (r as unknown as Record<string, unknown>)[c.key];
  if (c.key === 'k' || c.key === 's') return fmtPlain(v as number);
  return typeof v === 'number' ? fmt(v) : v === null || v === undefined || v === '' ? '—' : String(v);
}

export function VariantCell({ column: c, row: r }: { column: Column; row: VariantRow }) {
  const base = 'px-2 py-0.5 whitespace-nowrap';
  switch (c.key) {
    case 'status':
      return <td className={base}><StatusPill status={r.status} critical={r.critical} short /></td>;
    case 'counts':
      return <td className={`${base} num text-ink-2`}>{r.joints} · {r.members} · {r.reactions}</td>;
    case 'reason':
      return <td className="max-w-[28rem] truncate px-2 py-0.5 text-ink-2" title={r.reason ?? ''}>{r.reason || '—'}</td>;
    case 'variantId':
      return <td className={`${base} num text-ink-3`}>{r.variantId}</td>;
    case 'marks': {
      const cand = r.marks.filter((m) => m.kind === 'candidate').length;
      const rej = r.marks.length - cand;
      return <td className={`${base} num text-ink-2`}>{cand ? <span className="text-ok">{cand} cand.</span> : null}{cand && rej ? ' · ' : ''}{rej ? <span className="text-bad">{rej} rej.</span> : null}{!cand && !rej ? '—' : null}</td>;
    }
    case 'peakTension':
    case 'peakCompression': {
      const member = c.key === 'peakTension' ? r.peakTensionMember : r.peakCompressionMember;
      return <td className={`${base} num text-right`}>{cellText(c, r)}{member && <span className="ml-1 text-ink-3">{member}</span>}</td>;
    }
    case 'maxUtilisation':
      return <td className={`${base} num text-right ${r.maxUtilisation !== null && r.maxUtilisation > 1 ? 'font-semibold text-bad' : ''}`}>{cellText(c, r)}</td>;
    default:
      return <td className={`${base} num ${c.numeric ? 'text-right' : ''}`}>{cellText(c, r)}</td>;
  }
}
