/**
 * Parameter declarations the families share (span, depth, rise/slope, panels, supports), reading
 * values with defaults, and the generic checks. Lengths in metres, angles in degrees.
 */
import type { TopologyBuilder } from './builder';
import type { ParamSpec, Params } from './types';

/** Support arrangements of a simply supported family (left joint, right joint). */
export const SUPPORT_OPTIONS = ['pin-roller', 'pin-pin', 'roller-pin', 'roller-roller', 'pin-inclined'];

/** Span, metres. */
export function spanParam(def: number, description = 'Span between the support joints, m.'): ParamSpec {
  return { name: 'span', unit: 'm', default: def, min: 1, max: 300, description };
}

/** Depth of a parallel-chord truss, metres (centre to centre of the chords). */
export function depthParam(def: number, description = 'Depth between chord centrelines, m.'): ParamSpec {
  return { name: 'depth', unit: 'm', default: def, min: 0.05, max: 50, description };
}

/** Panel count (integer); `rule` states any parity rule in words. */
export function panelsParam(def: number, min: number, max: number, rule: string): ParamSpec {
  return { name: 'panels', unit: '', default: def, min, max, integer: true, description: `Number of panels; ${rule}.` };
}

/** Supports of the two end joints. */
export const SUPPORTS: ParamSpec = {
  name: 'supports', unit: '', default: 'pin-roller', options: SUPPORT_OPTIONS,
  description: 'End supports, left-right: pin-roller, pin-pin, roller-pin, roller-roller (a mechanism: no horizontal restraint), pin-inclined (right roller reacting at rollerAngle).',
};

/** Reaction direction of the inclined roller, degrees from +x counter-clockwise. */
export const ROLLER_ANGLE: ParamSpec = {
  name: 'rollerAngle', unit: 'deg', default: 60, min: 0, max: 180,
  description: 'pin-inclined only: direction of the right roller reaction, degrees from +x (90 = vertical; 0 or 180 passes through the pin: a mechanism).',
};

/** Rise of a pitched truss, metres, used when `slope` is 0. */
export const RISE: ParamSpec = {
  name: 'rise', unit: 'm', default: 3, min: 0.05, max: 100,
  description: 'Height of the apex above the supports, m; used when slope is 0.',
};

/** Slope of a pitched top chord, degrees; 0 means "use rise". */
export const SLOPE: ParamSpec = {
  name: 'slope', unit: 'deg', default: 0, min: 0, max: 60,
  description: 'Top chord slope, degrees; when above 0 it sets rise = span/2 · tan(slope) and rise is ignored.',
};

/** Numeric value of a parameter, its default when absent (NaN when a string was left unconverted). */
export function num(p: Params, spec: ParamSpec): number {
  const v = p[spec.name];
  if (v === undefined) return spec.default as number;
  return typeof v === 'number' ? v : Number.NaN;
}

/** Option value of a parameter, its default when absent. */
export function opt(p: Params, spec: ParamSpec): string {
  const v = p[spec.name];
  return v === undefined ? String(spec.default) : String(v);
}

/** Apex height of a pitched truss, metres: from `slope` (degrees) when above 0, else `rise`. */
export function riseOf(p: Params, span: number): number {
  const slope = num(p, SLOPE);
  return slope > 0 ? (span / 2) * Math.tan((slope * Math.PI) / 180) : num(p, RISE);
}

/** The empty answer of checkParams, shared (never modified: a problem starts a new array). */
const NONE: readonly string[] = Object.freeze([]);

/** Type, range, integer and option checks of every declared parameter; messages name the parameter. */
export function checkParams(specs: readonly ParamSpec[], p: Params): string[] {
  // called for every variant of a sweep: nothing is allocated unless something is wrong
  let out: string[] | undefined;
  for (let i = 0; i < specs.length; i++) {
    const s = specs[i];
    const v = p[s.name];
    if (v === undefined) continue;
    if (s.options) {
      if (typeof v !== 'string' || !s.options.includes(v)) (out ??= []).push(`${s.name} must be one of ${s.options.join(', ')} (got ${String(v)})`);
      continue;
    }
    if (typeof v !== 'number' || !Number.isFinite(v)) {
      (out ??= []).push(`${s.name} must be a finite number${s.unit ? ` in ${s.unit}` : ''} (got ${JSON.stringify(v)})`);
      continue;
    }
    if (s.integer && !Number.isInteger(v)) (out ??= []).push(`${s.name} must be a whole number (got ${v})`);
    if (s.min !== undefined && v < s.min) (out ??= []).push(`${s.name} must be at least ${s.min}${unitOf(s)} (got ${v}${unitOf(s)})`);
    if (s.max !== undefined && v > s.max) (out ??= []).push(`${s.name} must be at most ${s.max}${unitOf(s)} (got ${v}${unitOf(s)})`);
  }
  return out ?? (NONE as string[]);
}

const unitOf = (s: ParamSpec) => (s.unit ? ` ${s.unit}` : '');

/** Parity or set rule on `panels`: [] when it holds. */
export function checkPanels(p: Params, spec: ParamSpec, rule: 'even' | 'odd' | readonly number[]): string[] {
  const n = num(p, spec);
  if (!Number.isInteger(n)) return [];
  if (rule === 'even' && n % 2 !== 0) return [`panels must be even for this pattern (got ${n})`];
  if (rule === 'odd' && n % 2 !== 1) return [`panels must be odd for this pattern (got ${n})`];
  if (typeof rule !== 'string' && !rule.includes(n)) return [`panels must be one of ${rule.join(', ')} (got ${n})`];
  return NONE as string[];
}

/** Rise/slope check of a pitched truss: the apex height derived from slope must stay in rise's range. */
export function checkRise(p: Params, span: number): string[] {
  const h = riseOf(p, span);
  if (num(p, SLOPE) > 0 && Number.isFinite(h) && (h < RISE.min! || h > RISE.max!)) {
    return [`slope ${num(p, SLOPE)} deg gives rise ${h.toFixed(3)} m, outside ${RISE.min}–${RISE.max} m`];
  }
  return [];
}

/** The part of a topology key the end supports decide. */
export function supportsKey(p: Params, spec: ParamSpec = SUPPORTS): string {
  const s = opt(p, spec);
  return s === 'pin-inclined' ? `${s}@${num(p, ROLLER_ANGLE)}` : s;
}

/** Put the `supports` arrangement on the left and right end joints. */
export function applySupports(b: TopologyBuilder, p: Params, left: string, right: string): void {
  const s = opt(p, SUPPORTS);
  if (s === 'pin-roller') { b.support(left, 'pin'); b.support(right, 'roller', 90); }
  else if (s === 'pin-pin') { b.support(left, 'pin'); b.support(right, 'pin'); }
  else if (s === 'roller-pin') { b.support(left, 'roller', 90); b.support(right, 'pin'); }
  else if (s === 'roller-roller') { b.support(left, 'roller', 90); b.support(right, 'roller', 90); }
  else if (s === 'pin-inclined') { b.support(left, 'pin'); b.support(right, 'roller', num(p, ROLLER_ANGLE)); }
  else throw new RangeError(`unknown supports '${s}'`);
}

/** Every declared parameter with its default where `p` does not set it; extra names are kept. */
export function fillDefaults(specs: readonly ParamSpec[], p: Params): Params {
  const out: Params = { ...p };
  for (const s of specs) if (out[s.name] === undefined) out[s.name] = s.default;
  return out;
}
