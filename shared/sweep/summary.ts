/**
 * The running summary of a sweep: counts per status, the best variants by the study's objective,
 * and why variants were unstable or failed. Mergeable, so workers, shards and resumed runs add up
 * to the same summary as one uninterrupted run.
 */
import type { Params } from '../families/types';

/** The figures of one variant that the summary reads (forces kN, displacement m). */
export interface SummaryInput {
  index: number;
  id: string;
  params: Params;
  status: string;
  critical: boolean;
  peakTension: number;
  peakCompression: number;
  maxDisplacement: number;
  spanOverDeflection: number;
  reason: string;
  /** Member design: '' (not sized), sized, unsizable, not-settled. */
  designStatus?: string;
  /** Sized weight, kN, and largest utilisation (NaN when not sized). */
  weight?: number;
  maxUtilisation?: number;
  /** The deflection check of the sized truss (undefined when the study sets no limit). */
  deflectionOk?: boolean;
}

/** Figures an objective can rank by. */
export type ObjectiveFigure = 'peakTension' | 'peakCompression' | 'maxAbsForce' | 'maxDisplacement' | 'spanOverDeflection' | 'weight' | 'maxUtilisation';

/** The objective: a figure and a direction. */
export interface Objective { figure: ObjectiveFigure; sense: 'minimize' | 'maximize' }

/** One ranked variant. */
export interface BestEntry {
  index: number; id: string; params: Params; status: string; value: number;
  peakTension: number; peakCompression: number; maxDisplacement: number; spanOverDeflection: number;
  weight?: number; maxUtilisation?: number;
}

/** The summary as stored in summary.json. */
export interface SweepSummary {
  objective: Objective;
  evaluated: number;
  /** Variants dropped by the study's `where` filters. */
  filtered: number;
  byStatus: Record<'determinate' | 'indeterminate' | 'unstable' | 'error', number>;
  critical: number;
  best: BestEntry[];
  /** Distinct reasons of unstable and failed variants, with a count and the first example. */
  reasons: { status: string; reason: string; count: number; example: { index: number; id: string; params: Params } }[];
  /** Member design outcome counts, when the study sizes members. */
  design?: { sized: number; unsizable: number; notSettled: number };
}

/** How many best variants a summary keeps. */
export const BEST_KEPT = 10;
const REASONS_KEPT = 50;

/** An empty summary. */
export function emptySummary(objective: Objective): SweepSummary {
  return { objective, evaluated: 0, filtered: 0, byStatus: { determinate: 0, indeterminate: 0, unstable: 0, error: 0 }, critical: 0, best: [], reasons: [] };
}

/** Every member passes and, when the study sets a limit, so does the deflection. */
function passesDesign(v: Pick<SummaryInput, 'designStatus' | 'deflectionOk'>): boolean {
  return v.designStatus === 'sized' && v.deflectionOk !== false;
}

/** The objective's figure of a variant (NaN when it has none). */
export function figureOf(v: Pick<SummaryInput, 'peakTension' | 'peakCompression' | 'maxDisplacement' | 'spanOverDeflection' | 'designStatus' | 'weight' | 'maxUtilisation' | 'deflectionOk'>, f: ObjectiveFigure): number {
  switch (f) {
    // Weight and utilisation rank only variants whose every member passes.
    case 'weight': return passesDesign(v) ? (v.weight ?? NaN) : NaN;
    case 'maxUtilisation': return passesDesign(v) ? (v.maxUtilisation ?? NaN) : NaN;
    case 'peakTension': return Number.isFinite(v.peakTension) ? v.peakTension : 0;
    case 'peakCompression': return Number.isFinite(v.peakCompression) ? -v.peakCompression : 0;
    case 'maxAbsForce': {
      const t = Number.isFinite(v.peakTension) ? v.peakTension : 0;
      const c = Number.isFinite(v.peakCompression) ? -v.peakCompression : 0;
      return Math.max(t, c);
    }
    case 'maxDisplacement': return v.maxDisplacement;
    case 'spanOverDeflection': return v.spanOverDeflection;
  }
}

const better = (o: Objective, a: BestEntry, b: BestEntry) =>
  a.value === b.value ? a.index < b.index : o.sense === 'minimize' ? a.value < b.value : a.value > b.value;

function offerBest(s: SweepSummary, e: BestEntry): void {
  const list = s.best;
  if (list.length === BEST_KEPT && !better(s.objective, e, list[list.length - 1])) return;
  let i = list.length;
  while (i > 0 && better(s.objective, e, list[i - 1])) i--;
  list.splice(i, 0, e);
  if (list.length > BEST_KEPT) list.pop();
}

function offerReason(s: SweepSummary, status: string, reason: string, count: number, example: SweepSummary['reasons'][number]['example']): void {
  const r = findReason(s, status, reason);
  if (r) {
    r.count += count;
    if (example.index < r.example.index) r.example = example;
  } else if (s.reasons.length < REASONS_KEPT) s.reasons.push({ status, reason, count, example });
}

/**
 * Add one variant. The record may be reused by the caller: what is kept is copied.
 * @param names - the parameters to keep with a kept variant (default: all of `v.params`); pass the
 *   family's names so a summary built live equals one rebuilt from the JSON lines
 */
export function addToSummary(s: SweepSummary, v: SummaryInput, names?: readonly string[]): void {
  s.evaluated++;
  const st = v.status as keyof SweepSummary['byStatus'];
  if (st in s.byStatus) s.byStatus[st]++;
  if (v.critical) s.critical++;
  if (v.designStatus) {
    s.design ??= { sized: 0, unsizable: 0, notSettled: 0 };
    if (v.designStatus === 'sized') s.design.sized++;
    else if (v.designStatus === 'unsizable') s.design.unsizable++;
    else if (v.designStatus === 'not-settled') s.design.notSettled++;
  }
  if (st === 'determinate' || st === 'indeterminate') {
    const value = figureOf(v, s.objective.figure);
    const last = s.best.length === BEST_KEPT ? s.best[BEST_KEPT - 1] : undefined;
    // Most variants do not make the list: decide before building the entry.
    const mayEnter = !last || (value === last.value ? v.index < last.index : s.objective.sense === 'minimize' ? value < last.value : value > last.value);
    if (Number.isFinite(value) && mayEnter) {
      offerBest(s, {
        index: v.index, id: v.id, params: keep(v.params, names), status: v.status, value,
        peakTension: v.peakTension, peakCompression: v.peakCompression, maxDisplacement: v.maxDisplacement, spanOverDeflection: v.spanOverDeflection,
        ...(v.designStatus ? { weight: v.weight, maxUtilisation: v.maxUtilisation } : {}),
      });
    }
  } else {
    // One reason repeats over many variants: count it without copying the variant.
    const r = findReason(s, v.status, v.reason);
    if (r) {
      r.count++;
      if (v.index < r.example.index) r.example = { index: v.index, id: v.id, params: keep(v.params, names) };
    } else offerReason(s, v.status, v.reason, 1, { index: v.index, id: v.id, params: keep(v.params, names) });
  }
}

/** A copy of the parameters to keep (all of them when `names` is not given). */
function keep(p: Params, names: readonly string[] | undefined): Params {
  if (!names) return { ...p };
  const o: Params = {};
  for (const n of names) o[n] = p[n];
  return o;
}

function findReason(s: SweepSummary, status: string, reason: string): SweepSummary['reasons'][number] | undefined {
  for (const r of s.reasons) if (r.status === status && r.reason === reason) return r;
  return undefined;
}

/** Merge b into a (same objective). */
export function mergeSummary(a: SweepSummary, b: SweepSummary): SweepSummary {
  a.evaluated += b.evaluated;
  a.filtered += b.filtered;
  for (const k of Object.keys(a.byStatus) as (keyof SweepSummary['byStatus'])[]) a.byStatus[k] += b.byStatus[k];
  a.critical += b.critical;
  if (b.design) {
    a.design ??= { sized: 0, unsizable: 0, notSettled: 0 };
    a.design.sized += b.design.sized;
    a.design.unsizable += b.design.unsizable;
    a.design.notSettled += b.design.notSettled;
  }
  for (const e of b.best) offerBest(a, e);
  for (const r of b.reasons) offerReason(a, r.status, r.reason, r.count, r.example);
  a.reasons.sort((p, q) => p.example.index - q.example.index);
  return a;
}

/** Read a variant back from its JSON line (the shape `jsonLine` writes). */
export function summaryInputFromJson(o: Record<string, unknown>): SummaryInput {
  const val = (k: string) => {
    const p = o[k] as { value?: number } | null;
    return p && typeof p.value === 'number' ? p.value : NaN;
  };
  return {
    index: o.index as number, id: o.id as string, params: o.params as Params, status: o.status as string, critical: Boolean(o.critical),
    peakTension: val('peakTension'), peakCompression: val('peakCompression'), maxDisplacement: val('maxDisplacement'),
    spanOverDeflection: typeof o.spanOverDeflection === 'number' ? o.spanOverDeflection : NaN, reason: (o.reason as string) ?? '',
    ...designFromJson(o.design),
  };
}

function designFromJson(d: unknown): Pick<SummaryInput, 'designStatus' | 'weight' | 'maxUtilisation' | 'deflectionOk'> {
  if (!d || typeof d !== 'object') return {};
  const o = d as { status?: string; weight?: number; maxUtilisation?: number; deflectionOk?: boolean | null };
  return { designStatus: o.status ?? '', weight: o.weight ?? NaN, maxUtilisation: o.maxUtilisation ?? NaN, deflectionOk: o.deflectionOk ?? undefined };
}
