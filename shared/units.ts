/**
 * Units of model and study files, read through a private mathjs instance and converted to
 * the engine's SI: m, kN, m², kN/m². Bad units are values (`{ error }`), never exceptions.
 */
import type { Unit } from 'mathjs';
import { messages } from './errors';
import { mathjs } from './math';

/** A converted number, or why it could not be converted. */
export type UnitResult =
  | { value: number; error?: undefined; code?: undefined }
  | { error: string; code: 'unknown-unit' | 'wrong-dimension' | 'out-of-range' | 'bad-quantity'; value?: undefined };

interface Dimension { si: string; noun: string }
const LENGTH: Dimension = { si: 'm', noun: 'a length' };
const FORCE: Dimension = { si: 'kN', noun: 'a force' };
const AREA: Dimension = { si: 'm^2', noun: 'an area' };
const MODULUS: Dimension = { si: 'kN/m^2', noun: 'a modulus (force per area)' };
/** What parseQuantity calls the dimension of its target. */
const NOUNS: Dimension[] = [
  LENGTH, FORCE, AREA,
  { si: 'kN/m^2', noun: 'a force per area' },
  { si: 'kN/m', noun: 'a force per length' },
  { si: 'kN/m^3', noun: 'a force per volume' },
];

const unknown = (u: string, why = ''): UnitResult => ({ error: messages['unknown-unit'](u, why), code: 'unknown-unit' });
const wrong = (u: string, noun: string): UnitResult => ({ error: messages['wrong-dimension'](u, noun), code: 'wrong-dimension' });
const outOfRange = (q: string): UnitResult => ({ error: messages['out-of-range'](`'${q}'`), code: 'out-of-range' });

/** Units that parseQuantity may take a bare number in without parsing (they are known to mathjs). */
const KNOWN = new Set(NOUNS.map((d) => d.si));

/** Accept the spellings people type: m², mm³, kN·m. */
function normalise(text: string): string {
  return text.trim().replace(/²/g, '^2').replace(/³/g, '^3').replace(/[·⋅]/g, '*');
}

function parse(text: string): Unit | undefined {
  try {
    return mathjs().unit(text);
  } catch {
    return undefined;
  }
}

/** A unit with no number: 'mm', 'N/mm^2'. */
function parseUnit(text: string): Unit | UnitResult {
  const norm = normalise(text);
  if (!norm) return unknown(text, 'empty');
  const u = parse(norm);
  if (!u) return unknown(text);
  if ((u.value as number | null) !== null) return unknown(text, 'give a unit without a number');
  return u;
}

function isResult(x: Unit | UnitResult): x is UnitResult {
  return 'error' in x && typeof x.error === 'string';
}

function factor(text: string, dim: Dimension): UnitResult {
  const u = parseUnit(text);
  if (isResult(u)) return u;
  const target = mathjs().unit(dim.si);
  if (!u.equalBase(target)) return wrong(text, dim.noun);
  return { value: mathjs().unit(1, normalise(text)).toNumber(dim.si) };
}

/** Metres per one `u` (e.g. 'mm' → 0.001, 'ft' → 0.3048). */
export function lengthFactor(u: string): UnitResult {
  return factor(u, LENGTH);
}

/** Kilonewtons per one `u` (e.g. 'N' → 0.001, 'kip' → 4.4482216). */
export function forceFactor(u: string): UnitResult {
  return factor(u, FORCE);
}

/** Square metres per one `u` (e.g. 'mm^2' → 1e-6, 'in^2' → 6.4516e-4). */
export function areaFactor(u: string): UnitResult {
  return factor(u, AREA);
}

/** kN/m² per one `u`: MPa, GPa, ksi, psi, N/mm^2, kN/m^2, kPa or any other force per area. */
export function modulusFactor(u: string): UnitResult {
  return factor(u, MODULUS);
}

/**
 * Read a quantity and express it in `targetUnit`.
 * @param value - a number (in `defaultUnit`) or text such as "0.75 kPa" or "12" (then `defaultUnit`)
 * @param defaultUnit - unit of a bare number
 * @param targetUnit - unit of the result
 * @returns `{ value }` in `targetUnit`, or `{ error }` for an unknown unit or one of another dimension
 */
export function parseQuantity(value: number | string, defaultUnit: string, targetUnit: string): UnitResult {
  // A bare number already in the target unit converts by a factor of one: no parsing (sweep workers
  // get their quantities this way, and never build the unit library).
  if (typeof value === 'number' && defaultUnit === targetUnit && KNOWN.has(targetUnit)) {
    return Number.isFinite(value) ? { value } : { error: messages['schema-not-finite'](String(value)), code: 'out-of-range' };
  }
  const target = parseUnit(targetUnit);
  if (isResult(target)) return target;
  const noun = NOUNS.find((d) => target.equalBase(mathjs().unit(d.si)))?.noun ?? `convertible to ${targetUnit}`;
  const text = typeof value === 'string' ? value.trim() : '';
  let q: Unit | undefined;
  if (typeof value === 'number' || (text !== '' && Number.isFinite(Number(text)))) {
    const n = typeof value === 'number' ? value : Number(text);
    if (!Number.isFinite(n)) return { error: messages['schema-not-finite'](String(n)), code: 'out-of-range' };
    const d = parseUnit(defaultUnit);
    if (isResult(d)) return d;
    if (!d.equalBase(target)) return wrong(defaultUnit, noun);
    q = mathjs().unit(n, normalise(defaultUnit));
  } else {
    q = parse(normalise(text));
    if (!q || (q.value as number | null) === null) return { error: messages['bad-quantity'](text), code: 'bad-quantity' };
    if (!q.equalBase(target)) return wrong(text, noun);
  }
  const out = q.toNumber(normalise(targetUnit));
  return Number.isFinite(out) ? { value: out } : outOfRange(typeof value === 'string' ? value : String(value));
}
