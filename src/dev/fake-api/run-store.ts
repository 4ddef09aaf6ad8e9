/**
 * A fake run's variants, computed in the browser by the same engine as the CLI (resolveStudy and
 * VariantEvaluator), kept in columns (typed arrays) so a run of 100,000+ variants stays small.
 * Figures as the CLI records them: forces and weight kN (compression negative), displacement m.
 */
import { resolveStudy, type ResolvedStudy } from '@shared/sweep/resolve-study';
import { VariantEvaluator } from '@shared/sweep/evaluate';
import { spaceSize } from '@shared/sweep/space';
import type { VariantRow, VariantStatus } from '@/lib/run-types';

export const FIGURE_KEYS = ['peakTension', 'peakCompression', 'maxDisplacement', 'spanOverDeflection', 'weight', 'maxUtilisation'] as const;
export type FigureKey = (typeof FIGURE_KEYS)[number];
const STATUS_CODES: VariantStatus[] = ['determinate', 'indeterminate', 'unstable', 'error'];

export interface RunStore {
  resolved: ResolvedStudy;
  paramNames: string[];
  /** Numeric parameters (what the server keeps in p1..p6). */
  numericParams: string[];
  n: number;
  index: Int32Array;
  status: Uint8Array;
  critical: Uint8Array;
  ints: Record<'joints' | 'members' | 'reactions' | 'k' | 's', Int16Array>;
  figures: Record<FigureKey, Float64Array>;
  params: Record<string, Float64Array | string[]>;
  variantId: string[];
  reason: string[];
  tensionMember: string[];
  compressionMember: string[];
  spaceSize: number;
}

const nan = (v: number) => (Number.isFinite(v) ? v : NaN);

/** Sweep a study file in the browser; `limit` keeps the first variants only (an interrupted run). */
export function sweepStudy(study: unknown, limit = Infinity): RunStore {
  const resolved = resolveStudy(study);
  if (!resolved.setup) throw new Error(`demo study does not resolve: ${resolved.issues.map((i) => `${i.path} ${i.message}`).join('; ')}`);
  const setup = resolved.setup;
  const size = spaceSize(setup.plan);
  const paramNames = [...setup.plan.paramNames];
  const ev = new VariantEvaluator(setup);
  const cap = Math.min(size, limit);
  const s: RunStore = {
    resolved, paramNames, numericParams: [], n: 0, spaceSize: size,
    index: new Int32Array(cap), status: new Uint8Array(cap), critical: new Uint8Array(cap),
    ints: { joints: new Int16Array(cap), members: new Int16Array(cap), reactions: new Int16Array(cap), k: new Int16Array(cap), s: new Int16Array(cap) },
    figures: Object.fromEntries(FIGURE_KEYS.map((k) => [k, new Float64Array(cap)])) as RunStore['figures'],
    params: {}, variantId: [], reason: [], tensionMember: [], compressionMember: [],
  };
  for (let i = 0; i < size && s.n < cap; i++) {
    const r = ev.evaluate(i);
    if (!r) continue;
    const j = s.n++;
    if (j === 0) {
      s.numericParams = paramNames.filter((p) => typeof r.params[p] === 'number');
      for (const p of paramNames) s.params[p] = s.numericParams.includes(p) ? new Float64Array(cap) : [];
    }
    for (const p of paramNames) {
      const col = s.params[p];
      if (col instanceof Float64Array) col[j] = r.params[p] as number;
      else col[j] = String(r.params[p]);
    }
    s.index[j] = r.index;
    s.status[j] = STATUS_CODES.indexOf(r.status);
    s.critical[j] = r.critical ? 1 : 0;
    for (const k of ['joints', 'members', 'reactions', 'k', 's'] as const) s.ints[k][j] = r[k];
    const stable = r.status === 'determinate' || r.status === 'indeterminate';
    s.figures.peakTension[j] = stable && r.peakTensionMember ? r.peakTension : NaN;
    s.figures.peakCompression[j] = stable && r.peakCompressionMember ? r.peakCompression : NaN;
    s.figures.maxDisplacement[j] = stable ? nan(r.maxDisplacement) : NaN;
    s.figures.spanOverDeflection[j] = stable ? nan(r.spanOverDeflection) : NaN;
    s.figures.weight[j] = stable ? nan(r.design.weight) : NaN;
    s.figures.maxUtilisation[j] = stable ? nan(r.design.maxUtilisation) : NaN;
    s.variantId[j] = r.id;
    s.reason[j] = r.reason || r.design.reason;
    s.tensionMember[j] = r.peakTensionMember;
    s.compressionMember[j] = r.peakCompressionMember;
  }
  return s;
}

const orNull = (v: number) => (Number.isFinite(v) ? Number(v.toPrecision(9)) : null);

/** Row j as the variants endpoint answers it (marks added by the caller). */
export function rowOf(s: RunStore, j: number): Omit<VariantRow, 'marks'> {
  const params: Record<string, number | string> = {};
  for (const p of s.paramNames) params[p] = s.params[p][j];
  return {
    pk: j + 1, index: s.index[j], variantId: s.variantId[j], params, status: STATUS_CODES[s.status[j]],
    joints: s.ints.joints[j], members: s.ints.members[j], reactions: s.ints.reactions[j], k: s.ints.k[j], s: s.ints.s[j],
    critical: s.critical[j] === 1,
    peakTension: orNull(s.figures.peakTension[j]), peakTensionMember: s.tensionMember[j] || null,
    peakCompression: orNull(s.figures.peakCompression[j]), peakCompressionMember: s.compressionMember[j] || null,
    maxDisplacement: orNull(s.figures.maxDisplacement[j]), spanOverDeflection: orNull(s.figures.spanOverDeflection[j]),
    weight: orNull(s.figures.weight[j]), maxUtilisation: orNull(s.figures.maxUtilisation[j]), reason: s.reason[j] || null,
  };
}

/** A numeric field of row j (figures, counts, index, numeric parameters); NaN for none. */
export function numberOf(s: RunStore, field: string, j: number): number {
  if (field === 'index') return s.index[j];
  if (field in s.figures) return s.figures[field as FigureKey][j];
  if (field in s.ints) return s.ints[field as keyof RunStore['ints']][j];
  const col = s.params[field];
  if (col instanceof Float64Array) return col[j];
  return NaN;
}

export function isNumericField(s: RunStore, field: string): boolean {
  return field === 'index' || field in s.figures || field === 'k' || field === 's' || s.numericParams.includes(field);
}

export const statusOf = (s: RunStore, j: number): VariantStatus => STATUS_CODES[s.status[j]];

/** Row position of a variant index, or -1. */
export function rowAt(s: RunStore, index: number): number {
  let lo = 0;
  let hi = s.n - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (s.index[mid] === index) return mid;
    if (s.index[mid] < index) lo = mid + 1;
    else hi = mid - 1;
  }
  return -1;
}
