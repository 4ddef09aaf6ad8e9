/** Rows of the member table: geometry from the model, force of one loading from the analysis JSON. */
import type { Model } from '@shared/schemas/model';
import type { AnalysisJson } from '@shared/report/analysis-json';

export interface MemberRow {
  id: string;
  from: string;
  to: string;
  /** Model length unit. */
  length: number;
  /** Model force unit, tension positive; undefined without forces. */
  force?: number;
  tc: 'T' | 'C' | '0' | '—';
}

export type SortKey = keyof MemberRow;

/** Forces within this share of the loading's peak count as zero (as in the drawing). */
const ZERO = 1e-3;

export function memberRows(model: Model, analysis: AnalysisJson, loading?: string): MemberRow[] {
  const nodes = new Map(model.nodes.map((n) => [n.id, n]));
  const res = loading ? (analysis.results[loading] ?? analysis.cases[loading]) as { memberForces: Record<string, number> } | undefined : undefined;
  const forces = res?.memberForces;
  const peak = forces ? Math.max(0, ...Object.values(forces).map(Math.abs)) : 0;
  return model.members.map((m) => {
    const a = nodes.get(m.from), b = nodes.get(m.to);
    const force = forces?.[m.id];
    const tc = force === undefined ? '—' : Math.abs(force) <= ZERO * peak ? '0' : force > 0 ? 'T' : 'C';
    return { id: m.id, from: m.from, to: m.to, length: a && b ? Math.hypot(b.x - a.x, b.y - a.y) : NaN, force, tc };
  });
}

const collator = new Intl.Collator('en', { numeric: true });

/** Sort rows by a column; ids in natural order (BC2 before BC10), missing numbers last. */
export function sortRows(rows: readonly MemberRow[], key: SortKey, dir: 'ascending' | 'descending'): MemberRow[] {
  const s = dir === 'ascending' ? 1 : -1;
  return [...rows].sort((p, q) => {
    const a = p[key], b = q[key];
    if (typeof a === 'number' || typeof b === 'number') {
      const [x, y] = [typeof a === 'number' && Number.isFinite(a) ? a : NaN, typeof b === 'number' && Number.isFinite(b) ? b : NaN];
      if (Number.isNaN(x) || Number.isNaN(y)) return Number.isNaN(x) === Number.isNaN(y) ? 0 : Number.isNaN(x) ? 1 : -1;
      return s * (x - y) || collator.compare(p.id, q.id);
    }
    return s * collator.compare(String(a ?? ''), String(b ?? '')) || collator.compare(p.id, q.id);
  });
}
