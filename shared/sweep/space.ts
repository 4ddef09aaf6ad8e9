/**
 * The parameter space of a study: planned and checked once, then read variant by variant.
 *
 * The space is the Cartesian product of the dimensions of `vary` (see dimensions.ts for
 * how Latin hypercube dimensions are co-sampled). Variant `index` is decoded in mixed
 * radix with the last dimension changing fastest; `derived` is then evaluated in order,
 * and `passes` applies the `where` filters. Sizes and indices count variants before the
 * filters, so shards split the same index range on every machine.
 */
import type { Study } from '../schemas/study';
import { checkCombinations } from './check-combinations';
import { buildDimensions, tagged, type Dimension } from './dimensions';
import { compileExpression, type CompiledExpression, type ParsedExpression } from './expressions';
import { checkExpressions, checkNames, parseAll } from './space-checks';
import type { Issue, ParamSpec, Params, ParamValue } from './types';
import { checkValue, isIssueValue } from './values';

/** A checked, compiled study space. Read it with `variantAt` and `passes`. */
export interface SpacePlan {
  readonly family: string;
  /** The family's parameters, in the family's order (the inputs of `variantId`). */
  readonly paramNames: readonly string[];
  /** Family defaults overridden by `fixed`, in each parameter's unit. */
  readonly base: Readonly<Params>;
  readonly dimensions: readonly Dimension[];
  readonly derived: readonly CompiledExpression[];
  readonly filters: readonly CompiledExpression[];
  /** Number of variants before the filters. */
  readonly size: number;
  /** The one scope all expressions are evaluated in; internal, reused between variants. */
  readonly scope: Map<string, unknown>;
  /** `base` as two arrays, for `fill` (the values tagged: see `tagged` in dimensions.ts). */
  readonly baseNames: readonly string[];
  readonly baseValues: readonly ParamValue[];
}

/**
 * Check a study against its family's parameters and plan its space, before any work.
 * @param params - the family's parameter list
 * @returns the plan, or every issue found, each with its path in the study (and the
 *   0-based character position for expressions)
 */
export function planSpace(study: Study, params: readonly ParamSpec[]): SpacePlan | { issues: Issue[] } {
  const specs = new Map(params.map((p) => [p.name, p]));
  const { derived, filters, issues } = parseAll(study);
  issues.push(...checkNames(study, specs, [...derived, ...filters]));
  const base: Params = {};
  for (const p of params) base[p.name] = p.default;
  for (const [name, raw] of Object.entries(study.fixed ?? {})) {
    const v = checkValue(specs.get(name), raw, `fixed.${name}`);
    if (isIssueValue(v)) issues.push(v);
    else base[name] = v;
  }
  const built = buildDimensions(study, specs);
  issues.push(...built.issues);
  issues.push(...checkExpressions(study, specs, derived, filters));
  const caseIds = [...new Set((study.loads ?? []).map((l) => l.case))];
  issues.push(...checkCombinations(study.combinations, caseIds));
  const size = built.dimensions.reduce((n, d) => n * d.size, 1);
  if (size > Number.MAX_SAFE_INTEGER) issues.push({ path: 'vary', message: `the space has ${size.toExponential(2)} variants; that is too many to index` });
  if (issues.length) return { issues };

  const stringNames = new Set<string>(params.filter((p) => p.options).map((p) => p.name));
  for (const [name, v] of Object.entries(base)) if (typeof v === 'string') stringNames.add(name);
  for (const d of built.dimensions) d.names.forEach((n, k) => d.columns[k].some((v) => typeof v === 'string') && stringNames.add(n));
  const compile = (e: ParsedExpression, name: string) => compileExpression(e, name, stringNames);
  const plan: SpacePlan = {
    family: study.family,
    paramNames: params.map((p) => p.name),
    base,
    dimensions: built.dimensions,
    derived: derived.map((e) => compile(e, e.path.slice('derived.'.length))),
    filters: filters.map((e) => compile(e, '')),
    size,
    scope: new Map(Object.entries(base)),
    baseNames: Object.keys(base),
    baseValues: tagged(Object.values(base)),
  };
  const trial = size > 0 ? trialIssues(plan) : [];
  return trial.length ? { issues: trial } : plan;
}

/**
 * Number of variants of a plan before the `where` filters.
 */
export function spaceSize(plan: SpacePlan): number {
  return plan.size;
}

/**
 * The parameters of variant `index`: base values, the dimension values at that index
 * (mixed radix, last dimension fastest), then `derived` in order. A derived expression
 * that fails or gives something other than a number or string yields NaN: the variant
 * fails later as a data point, the sweep goes on.
 * @param index - 0 ≤ index < spaceSize(plan)
 * @param out - an object to fill and return, reused across calls to avoid allocation
 * @param digits - if given, receives each dimension's digit of `index` (see param-slots.ts)
 * @returns `out`, with every family parameter and study name, each in its own unit
 */
export function variantAt(plan: SpacePlan, index: number, out: Params = {}, digits?: Int32Array): Params {
  fill(plan, index, out, undefined, digits);
  return out;
}

/**
 * A params object to pass to `variantAt` again and again: every name it will fill set up front,
 * each field holding a string first, so that V8 keeps its fields tagged. Numbers then go in and
 * out as the boxes the dimension columns already hold, where a field of unboxed doubles would box
 * each number anew on every read by name (the families read params by name).
 */
export function paramsFor(plan: SpacePlan): Params {
  const out: Params = {};
  for (const n of plan.baseNames) out[n] = '';
  for (const d of plan.dimensions) for (const n of d.names) out[n] = '';
  for (const e of plan.derived) out[e.name] = '';
  return out;
}

/**
 * True when the parameters satisfy every `where` filter. A filter passes when it gives true
 * or a nonzero number; one that fails to evaluate does not pass.
 * @param params - from `variantAt` on the same plan
 */
export function passes(plan: SpacePlan, params: Readonly<Params>): boolean {
  if (plan.filters.length === 0) return true;
  const scope = plan.scope;
  for (const k in params) scope.set(k, params[k]);
  for (const f of plan.filters) {
    let r: unknown;
    try {
      r = f.code.evaluate(scope);
    } catch {
      return false;
    }
    if (!(r === true || (typeof r === 'number' && r !== 0 && r === r))) return false;
  }
  return true;
}

function fill(plan: SpacePlan, index: number, out: Params, issues?: Issue[], digits?: Int32Array): void {
  if (!(Number.isInteger(index) && index >= 0 && index < plan.size)) {
    throw new RangeError(`variant index ${index} is outside 0..${plan.size - 1}`);
  }
  const { scope, baseNames, baseValues, dimensions } = plan;
  // The expression scope is read only by derived parameters and filters: most studies have neither.
  const scoped = plan.derived.length > 0 || plan.filters.length > 0;
  for (let i = 0; i < baseNames.length; i++) {
    out[baseNames[i]] = baseValues[i];
    if (scoped) scope.set(baseNames[i], baseValues[i]);
  }
  let rest = index;
  for (let d = dimensions.length - 1; d >= 0; d--) {
    const dim = dimensions[d];
    const digit = rest % dim.size;
    rest = (rest - digit) / dim.size;
    if (digits) digits[d] = digit;
    for (let k = 0; k < dim.names.length; k++) {
      const v = dim.columns[k][digit];
      out[dim.names[k]] = v;
      if (scoped) scope.set(dim.names[k], v);
    }
  }
  for (const e of plan.derived) {
    let v: ParamValue;
    try {
      v = toParamValue(e.code.evaluate(scope));
    } catch (err) {
      issues?.push({ path: e.path, message: `cannot evaluate it for the first variant: ${(err as Error).message}` });
      v = NaN;
    }
    out[e.name] = v;
    scope.set(e.name, v);
  }
}

/** Evaluate everything for variant 0 so that type errors show up before any work. */
function trialIssues(plan: SpacePlan): Issue[] {
  const issues: Issue[] = [];
  fill(plan, 0, {}, issues);
  for (const f of plan.filters) {
    try {
      f.code.evaluate(plan.scope);
    } catch (err) {
      issues.push({ path: f.path, message: `cannot evaluate it for the first variant: ${(err as Error).message}` });
    }
  }
  return issues;
}

function toParamValue(v: unknown): ParamValue {
  if (typeof v === 'number' || typeof v === 'string') return v;
  if (typeof v === 'boolean') return v ? 1 : 0;
  return NaN;
}
