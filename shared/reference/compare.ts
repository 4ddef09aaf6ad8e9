/**
 * Comparing a recomputation with a reference case: the classification exactly, forces,
 * reactions and displacements within |got − want| ≤ absolute + relative·|want|. Every figure is
 * in the model's units; a figure the reference names and the recomputation lacks is a failure.
 */
import { formatPath } from '../errors';
import type { ExpectedLoading, ReferenceExpected, ReferenceTolerance } from '../schemas/reference-case';

/** The keys of the analyze JSON document that a comparison reads (`AnalysisJson` fits). */
export interface Recomputed {
  classification: { status: string; joints: number; members: number; reactions: number; mechanisms: number; selfStress: number; critical: boolean };
  /** Loading id → { memberForces, reactions, displacements }, in model units. */
  results: Readonly<Record<string, unknown>>;
}

interface RecomputedLoading {
  memberForces?: Record<string, number>;
  reactions?: Record<string, { rx: number; ry: number }>;
  displacements?: Record<string, { ux: number; uy: number }>;
}

/** Allowances in the model's units: force in its force unit, displacement in its length unit. */
export interface Allowance { force: number; displacement: number; relative: number }

/**
 * Convert a case tolerance (absolute force kN, displacement m) to the model's units.
 * @param units - kN per model force unit and m per model length unit
 */
export function allowanceFor(t: ReferenceTolerance, units: { forceFactor: number; lengthFactor: number }): Allowance {
  return { force: t.absolute.force / units.forceFactor, displacement: t.absolute.displacement / units.lengthFactor, relative: t.relative };
}

/** One compared figure. `got` is undefined when the recomputation lacks it. */
export interface FigureCheck {
  /** Dotted path in the case's `expected`, e.g. `results["ULS-1"].memberForces.BC3`. */
  figure: string;
  kind: 'exact' | 'force' | 'displacement';
  want: number | string | boolean;
  got?: number | string | boolean;
  /** |got − want|, model units (numeric figures only). */
  difference?: number;
  /** absolute + relative·|want|, model units (numeric figures only). */
  allowed?: number;
  ok: boolean;
  /** Why the figure is missing, in words. */
  note?: string;
}

/** The outcome of comparing one case. */
export interface CaseComparison {
  ok: boolean;
  /** Number of figures compared (classification keys included). */
  compared: number;
  /** Every figure out of tolerance or missing, in the order of the case. */
  failures: FigureCheck[];
  /** The figure that failed worst, or when all pass the one nearest its allowance. */
  worst?: FigureCheck;
  notes: string[];
}

const CLASSIFICATION_KEYS = ['status', 'joints', 'members', 'reactions', 'mechanisms', 'selfStress', 'critical'] as const;

/** How close a figure is to its limit: difference over allowance (Infinity for a mismatch). */
export function severity(f: FigureCheck): number {
  if (f.kind === 'exact' || f.got === undefined) return f.ok ? 0 : Infinity;
  const d = f.difference ?? NaN;
  const a = f.allowed ?? 0;
  if (!(d === d)) return Infinity;
  if (a === 0) return d === 0 ? 0 : Infinity;
  return d / a;
}

function numeric(figure: string, kind: 'force' | 'displacement', want: number, got: unknown, allow: Allowance, missing: string): FigureCheck {
  const allowed = (kind === 'force' ? allow.force : allow.displacement) + allow.relative * Math.abs(want);
  if (typeof got !== 'number') return { figure, kind, want, allowed, ok: false, note: missing };
  const difference = Math.abs(got - want);
  // NaN compares false, so a non-finite recomputation fails
  return { figure, kind, want, got, difference, allowed, ok: difference <= allowed };
}

function compareLoading(id: string, want: ExpectedLoading, got: RecomputedLoading, allow: Allowance, out: FigureCheck[]): void {
  for (const [m, v] of Object.entries(want.memberForces ?? {})) {
    const path = formatPath(['results', id, 'memberForces', m]);
    out.push(numeric(path, 'force', v, got.memberForces?.[m], allow, `no member '${m}' in the recomputation`));
  }
  for (const [n, r] of Object.entries(want.reactions ?? {})) {
    const have = got.reactions?.[n];
    for (const k of ['rx', 'ry'] as const) {
      if (r[k] === undefined) continue;
      const path = formatPath(['results', id, 'reactions', n, k]);
      out.push(numeric(path, 'force', r[k]!, have?.[k], allow, `no support at node '${n}' in the recomputation`));
    }
  }
  for (const [n, u] of Object.entries(want.displacements ?? {})) {
    const have = got.displacements?.[n];
    for (const k of ['ux', 'uy'] as const) {
      if (u[k] === undefined) continue;
      const path = formatPath(['results', id, 'displacements', n, k]);
      out.push(numeric(path, 'displacement', u[k]!, have?.[k], allow, `no node '${n}' in the recomputation`));
    }
  }
}

/**
 * Compare a recomputation with the expected figures of a case.
 * @param allow - allowances in the model's units (see `allowanceFor`)
 */
export function compareCase(expected: ReferenceExpected, got: Recomputed, allow: Allowance): CaseComparison {
  const checks: FigureCheck[] = [];
  for (const k of CLASSIFICATION_KEYS) {
    const want = expected.classification[k];
    const have = got.classification[k];
    checks.push({ figure: `classification.${k}`, kind: 'exact', want, got: have, ok: want === have });
  }
  const loadings = Object.keys(got.results);
  for (const [id, want] of Object.entries(expected.results ?? {})) {
    const have = got.results[id] as RecomputedLoading | undefined;
    if (have) {
      compareLoading(id, want, have, allow, checks);
      continue;
    }
    const why = loadings.length
      ? `loading '${id}' missing in the recomputation (it has ${loadings.join(', ')})`
      : `loading '${id}' missing in the recomputation (no results: the frame is ${got.classification.status === 'unstable' ? 'unstable' : 'unloaded'})`;
    checks.push({ figure: formatPath(['results', id]), kind: 'exact', want: `loading '${id}'`, ok: false, note: why });
  }
  const notes: string[] = [];
  if (expected.weight !== undefined) notes.push(`expected.weight (${expected.weight} kN) not compared: member weight is not yet computed`);
  const failures = checks.filter((c) => !c.ok);
  let worst: FigureCheck | undefined;
  const pool = failures.length ? failures : checks.filter((c) => c.kind !== 'exact');
  for (const c of pool) if (!worst || severity(c) > severity(worst)) worst = c;
  return { ok: failures.length === 0, compared: checks.length, failures, ...(worst ? { worst } : {}), notes };
}
