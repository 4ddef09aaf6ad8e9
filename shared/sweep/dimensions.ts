/**
 * The varied dimensions of a study: lists, ranges and samples turned into columns of values.
 *
 * Every dimension is crossed with the others (Cartesian product), with one exception: all
 * `lhs` dimensions that have the same `count` form one Latin hypercube. They are co-sampled,
 * read at the same index, and count as a single dimension of `count` points, placed where
 * the first of them stands in `vary`. `uniform` dimensions are crossed like lists.
 */
import type { Study, VarySample } from '../schemas/study';
import { lhsColumn, streamFor, uniformSample } from './sampling';
import type { Issue, ParamSpec, ParamValue } from './types';
import { checkNumber, expandList, expandRange, isIssueValue, MAX_DIMENSION_SIZE } from './values';

/** One dimension of the space: one name, or several co-sampled names (a Latin hypercube). */
export interface Dimension {
  readonly names: readonly string[];
  readonly kind: 'list' | 'range' | 'uniform' | 'lhs';
  /** Number of points along this dimension. */
  readonly size: number;
  /** columns[k][i]: value of names[k] at point i, in that parameter's unit. */
  readonly columns: readonly (readonly ParamValue[])[];
}

/** Seed used when a study gives none. */
export const DEFAULT_SEED = 1;

/**
 * Build the dimensions of `study.vary`, in the order written.
 * @param specs - the family's parameters by name (auxiliary names have none)
 * @returns the dimensions, and issues found in the values
 */
export function buildDimensions(study: Study, specs: ReadonlyMap<string, ParamSpec>): { dimensions: Dimension[]; issues: Issue[] } {
  const seed = study.samples?.seed ?? DEFAULT_SEED;
  const dimensions: { names: string[]; kind: Dimension['kind']; size: number; columns: ParamValue[][] }[] = [];
  const hypercubes = new Map<number, (typeof dimensions)[number]>();
  const issues: Issue[] = [];
  for (const [name, v] of Object.entries(study.vary ?? {})) {
    const path = `vary.${name}`;
    const spec = specs.get(name);
    if (Array.isArray(v)) {
      const values = expandList(spec, v, path);
      if (values.length && typeof values[0] === 'object') issues.push(...(values as Issue[]));
      else dimensions.push({ names: [name], kind: 'list', size: values.length, columns: [values as ParamValue[]] });
    } else if ('sample' in v) {
      const bad = checkSample(spec, v, path);
      if (bad.length) {
        issues.push(...bad);
        continue;
      }
      const random = streamFor(seed, `${v.sample}:${name}`);
      if (v.sample === 'uniform') {
        dimensions.push({ names: [name], kind: 'uniform', size: v.count, columns: [uniformSample(v.min, v.max, v.count, random)] });
        continue;
      }
      const column = lhsColumn(v.min, v.max, v.count, random);
      const cube = hypercubes.get(v.count);
      if (cube) {
        cube.names.push(name);
        cube.columns.push(column);
      } else {
        const dim = { names: [name], kind: 'lhs' as const, size: v.count, columns: [column] };
        hypercubes.set(v.count, dim);
        dimensions.push(dim);
      }
    } else if ('step' in v || 'count' in v) {
      const values = expandRange(spec, v, path);
      if (values.length && typeof values[0] === 'object') issues.push(...(values as Issue[]));
      else dimensions.push({ names: [name], kind: 'range', size: values.length, columns: [values as number[]] });
    } else {
      issues.push({ path, message: 'give a list, {from, to, step}, {from, to, count} or {sample, min, max, count}' });
    }
  }
  for (const d of dimensions) d.columns = d.columns.map(tagged);
  return { dimensions, issues };
}

/**
 * A column as an array of tagged values. V8 stores an array of numbers only unboxed, and then each
 * read of a value into a variant's params boxes it anew (16 bytes per parameter and variant, the
 * largest share of a sweep's garbage); an array that has held a string keeps its elements tagged,
 * so each number is boxed once, here.
 */
export function tagged(column: readonly ParamValue[]): ParamValue[] {
  const out: ParamValue[] = [''];
  out.pop();
  for (let i = 0; i < column.length; i++) out.push(column[i]);
  return out;
}

function checkSample(spec: ParamSpec | undefined, v: VarySample, path: string): Issue[] {
  if (spec?.options) return [{ path: `${path}.sample`, message: `'${spec.name}' is a choice; give its options as a list` }];
  if (spec?.integer) {
    return [{ path: `${path}.sample`, message: `'${spec.name}' takes whole numbers; samples would repeat, give a list or a range` }];
  }
  const issues: Issue[] = [];
  if (!(Number.isInteger(v.count) && v.count >= 1 && v.count <= MAX_DIMENSION_SIZE)) {
    issues.push({ path: `${path}.count`, message: `count must be a whole number from 1 to ${MAX_DIMENSION_SIZE}; got ${v.count}` });
  }
  const min = checkNumber(spec, v.min, `${path}.min`);
  const max = checkNumber(spec, v.max, `${path}.max`);
  if (isIssueValue(min)) issues.push(min);
  if (isIssueValue(max)) issues.push(max);
  if (!(Number.isFinite(v.min) && Number.isFinite(v.max))) issues.push({ path, message: 'min and max must be finite numbers' });
  else if (!(v.min < v.max)) issues.push({ path: `${path}.max`, message: `max (${v.max}) must be greater than min (${v.min})` });
  return issues;
}
