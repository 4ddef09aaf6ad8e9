/**
 * The table of differences between compared variants: one row per parameter and figure, the
 * values side by side, whether they differ, and which column is best where "better" has a
 * direction (lighter, lower peaks and utilisation, stiffer; stable before unstable).
 */
import type { VariantRow } from '@/lib/run-types';
import { FIGURES, STATUS_LABEL, type Better } from '@/lib/figures';
import { fmt, fmtPlain } from '@/lib/format';

export interface DifferenceRow {
  key: string;
  label: string;
  unit: string;
  values: string[];
  /** Columns holding the best value (ties all count); empty when there is no "better". */
  best: number[];
  differs: boolean;
}

const STATUS_RANK: Record<string, number> = { determinate: 0, indeterminate: 0, unstable: 2, error: 3 };

function bestOf(values: (number | null)[], better: Better | undefined): number[] {
  if (!better) return [];
  const score = values.map((v) => (v === null || !Number.isFinite(v) ? null : better === 'high' ? -v : better === 'abs-low' ? Math.abs(v) : v));
  const known = score.filter((s): s is number => s !== null);
  if (known.length < 2) return [];
  const min = Math.min(...known);
  if (known.every((s) => s === min)) return [];
  return score.flatMap((s, i) => (s !== null && Math.abs(s - min) <= 1e-12 * Math.max(1, Math.abs(min)) ? [i] : []));
}

function row(key: string, label: string, unit: string, raw: (number | string | null)[], better?: Better, plain = false): DifferenceRow {
  const values = raw.map((v) => (v === null || v === undefined ? '—' : typeof v === 'number' && !plain ? fmt(v) : fmtPlain(v)));
  const numeric = raw.every((v) => v === null || typeof v === 'number');
  return { key, label, unit, values, differs: new Set(values).size > 1, best: numeric ? bestOf(raw as (number | null)[], better) : [] };
}

export function differenceRows(variants: readonly VariantRow[], paramNames: readonly string[]): DifferenceRow[] {
  const rows: DifferenceRow[] = paramNames.map((p) => row(`param:${p}`, p, '', variants.map((v) => v.params[p] ?? null), undefined, true));
  const status = row('status', 'Status', '', variants.map((v) => `${STATUS_LABEL[v.status] ?? v.status}${v.critical ? ' (critical)' : ''}`));
  const ranks = variants.map((v) => STATUS_RANK[v.status] ?? 3);
  status.best = bestOf(ranks, 'low');
  rows.push(status);
  for (const f of FIGURES) {
    if (f.key === 'index') continue;
    const plain = f.key === 'k' || f.key === 's';
    rows.push(row(f.key, f.label, f.unit, variants.map((v) => (v as unknown as Record<string, number | null>)[f.key] ?? null), f.better, plain));
  }
  return rows;
}
