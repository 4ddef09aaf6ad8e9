/**
 * Values of one parameter as a study gives them: checked against the family's parameter
 * (unit, bounds, integer, options) and expanded from lists and ranges.
 */
import { mathjs } from '../math';
import type { VaryCount, VaryStep } from '../schemas/study';
import type { Issue, ParamSpec, ParamValue } from './types';

/** Relative slack within which a range step lands on `to` (the study file promises 1e-9). */
const RANGE_SLACK = 1e-9;

/** Most values one dimension may have; more is nearly always a step in the wrong unit. */
export const MAX_DIMENSION_SIZE = 1_000_000;

/**
 * Check one value for a parameter and bring it to the parameter's unit.
 * @param spec - the family's parameter, or undefined for a study's own auxiliary name
 * @param value - a number in spec.unit, an option, or a quantity string such as "24 ft"
 * @returns the value in spec.unit (or the option), or an issue at `path`
 */
export function checkValue(spec: ParamSpec | undefined, value: ParamValue, path: string): ParamValue | Issue {
  if (!spec) return value;
  if (spec.options) {
    if (typeof value === 'string' && spec.options.includes(value)) return value;
    return { path, message: `'${spec.name}' is one of ${spec.options.map((o) => `"${o}"`).join(', ')}; got ${JSON.stringify(value)}` };
  }
  let v: number;
  if (typeof value === 'number') v = value;
  else {
    try {
      v = mathjs().unit(value).toNumber(spec.unit);
    } catch (e) {
      const unitText = spec.unit ? ` in ${spec.unit}` : '';
      return { path, message: `'${spec.name}' takes a number${unitText}; cannot read "${value}": ${(e as Error).message}` };
    }
  }
  return checkNumber(spec, v, path);
}

/**
 * Check a number against the parameter's bounds and integrality.
 * @returns the number, or an issue at `path`
 */
export function checkNumber(spec: ParamSpec | undefined, v: number, path: string): number | Issue {
  if (!spec) return v;
  const u = spec.unit ? ` ${spec.unit}` : '';
  if (!Number.isFinite(v)) return { path, message: `'${spec.name}' must be a finite number` };
  if (spec.integer && !Number.isInteger(v)) return { path, message: `'${spec.name}' must be a whole number; got ${v}` };
  if (spec.min !== undefined && v < spec.min) return { path, message: `'${spec.name}' must be at least ${spec.min}${u}; got ${v}` };
  if (spec.max !== undefined && v > spec.max) return { path, message: `'${spec.name}' must be at most ${spec.max}${u}; got ${v}` };
  return v;
}

/** True when a check returned an issue rather than a value. */
export function isIssueValue(x: ParamValue | Issue): x is Issue {
  return typeof x === 'object';
}

/**
 * The values of a range, by step (`to` included when a step lands on it within 1e-9 of the
 * range) or by count (both ends included), rounded to 15 significant digits so that
 * 0.1 · 3 reads 0.3.
 * @param path - path of the range in the study, e.g. `vary.depth`
 * @returns the values in the parameter's unit, or issues
 */
export function expandRange(spec: ParamSpec | undefined, range: VaryStep | VaryCount, path: string): number[] | Issue[] {
  const { from, to } = range;
  const issues: Issue[] = [];
  if (spec?.options) return [{ path, message: `'${spec.name}' is a choice; give its options as a list` }];
  if (!Number.isFinite(from) || !Number.isFinite(to)) return [{ path, message: 'from and to must be finite numbers' }];
  if (from > to) issues.push({ path: `${path}.to`, message: `to (${to}) must not be less than from (${from})` });
  if ('step' in range && !(range.step > 0 && Number.isFinite(range.step))) {
    issues.push({ path: `${path}.step`, message: `step must be a finite number > 0; got ${range.step}` });
  }
  if ('count' in range && !(Number.isInteger(range.count) && range.count >= 1)) {
    issues.push({ path: `${path}.count`, message: `count must be a whole number ≥ 1; got ${range.count}` });
  } else if ('count' in range && range.count === 1 && from !== to) {
    issues.push({ path: `${path}.count`, message: 'count 1 needs from = to; give at least 2 values for a range' });
  }
  if (issues.length) return issues;
  const size = 'step' in range ? Math.floor((to - from) / range.step + RANGE_SLACK) + 1 : range.count;
  if (size > MAX_DIMENSION_SIZE) {
    return [{ path: `${path}.${'step' in range ? 'step' : 'count'}`, message: `the range has ${size} values; at most ${MAX_DIMENSION_SIZE} are allowed` }];
  }
  const values: number[] = [];
  if ('step' in range) {
    const n = size - 1;
    for (let k = 0; k <= n; k++) values.push(round15(from + k * range.step));
    if (Math.abs(values[n] - to) <= RANGE_SLACK * Math.max(1, Math.abs(to - from))) values[n] = to;
  } else {
    const n = range.count - 1;
    for (let k = 0; k <= n; k++) values.push(n === 0 ? from : k === n ? to : round15(from + ((to - from) * k) / n));
  }
  if (spec?.integer && values.some((v) => !Number.isInteger(v))) {
    const at = 'step' in range ? (Number.isInteger(from) ? 'step' : 'from') : 'count';
    return [{ path: `${path}.${at}`, message: `'${spec.name}' must be a whole number; the range gives ${values.find((v) => !Number.isInteger(v))}` }];
  }
  const first = checkNumber(spec, values[0], `${path}.from`);
  if (isIssueValue(first)) return [first];
  const last = checkNumber(spec, values[values.length - 1], `${path}.to`);
  return isIssueValue(last) ? [last] : values;
}

/**
 * Check and convert every entry of a list; duplicates are an issue (they would repeat variants).
 * @returns the values, or issues at `path[i]`
 */
export function expandList(spec: ParamSpec | undefined, list: readonly ParamValue[], path: string): ParamValue[] | Issue[] {
  if (list.length === 0) return [{ path, message: 'the list is empty' }];
  const values: ParamValue[] = [];
  const issues: Issue[] = [];
  list.forEach((raw, i) => {
    const v = checkValue(spec, raw, `${path}[${i}]`);
    if (isIssueValue(v)) issues.push(v);
    else if (values.includes(v)) issues.push({ path: `${path}[${i}]`, message: `${JSON.stringify(raw)} is listed twice` });
    else values.push(v);
  });
  return issues.length ? issues : values;
}

function round15(x: number): number {
  return Number(x.toPrecision(15));
}
