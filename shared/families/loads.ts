/**
 * Study loads → joint loads of one case, kN: tributary lengths along a chord for area and line
 * loads, half of each member's weight to its ends for self-weight, point loads by joint id.
 */
import type { StudyLoad } from '../schemas/study-loads';
import type { FamilyTopology } from './types';

/** Unit weight of steel, kN/m³ (the default self-weight density). */
export const STEEL_UNIT_WEIGHT = 78.5;

/** A quantity the caller should already have converted to a number in the engine's unit. */
function value(v: number | string | undefined, what: string): number {
  if (v === undefined) return 0;
  if (typeof v !== 'number') throw new RangeError(`${what} is "${v}": convert quantities to numbers before addCaseLoads`);
  return v;
}

/** Add w (kN/m, downward positive) over the chain's segments, half of each segment to each end. */
function addAlongChord(chain: Int32Array, x: Float64Array, y: Float64Array, w: number, byLength: boolean, out: Float64Array, at: number): void {
  for (let k = 1; k < chain.length; k++) {
    const a = chain[k - 1];
    const b = chain[k];
    const dx = x[b] - x[a];
    const len = byLength ? Math.hypot(dx, y[b] - y[a]) : Math.abs(dx);
    const half = (w * len) / 2;
    out[at + 2 * a + 1] -= half;
    out[at + 2 * b + 1] -= half;
  }
}

/**
 * Turn study loads into joint loads for one case, kN, [fx0, fy0, ...], adding into `out`.
 * Quantities must already be numbers: area value kN/m², spacing m, line value kN/m, point fx/fy kN,
 * self-weight kN/m.
 * - area: w = value × spacing (kN/m) along the loaded chord; line: w = value.
 *   A chord joint takes half of each adjacent segment of its chord chain, measured by horizontal
 *   projection (projection 'plan', the default) or by segment length ('length'). Downward
 *   positive in the study, so fy is negative.
 * - self-weight: per member, weight (kN/m; default memberArea[e] m² × 78.5 kN/m³) × member
 *   length, half to each end joint, downward.
 * - point: fx, fy added at the joint with that id, as the model file signs them (+ right, + up).
 * Loads of all cases in `loads` are added; filter to one case first.
 * @param at - where joint 0's fx sits in `out` (a sweep keeps every case in one array)
 * @throws RangeError for a quantity left as a string or an unknown joint id (check with `unknownJoints`)
 */
export function addCaseLoads(
  loads: readonly StudyLoad[], topo: FamilyTopology, x: Float64Array, y: Float64Array,
  memberArea: Float64Array, out: Float64Array, at = 0,
): void {
  for (const load of loads) {
    if (load.kind === 'area' || load.kind === 'line') {
      const w = load.kind === 'area'
        ? value(load.value, 'area load value') * value(load.spacing, 'spacing')
        : value(load.value, 'line load value');
      const chain = load.chord === 'top' ? topo.topChord : topo.bottomChord;
      addAlongChord(chain, x, y, w, load.projection === 'length', out, at);
    } else if (load.kind === 'self-weight') {
      const given = load.weight === undefined ? undefined : value(load.weight, 'self-weight');
      for (let e = 0; e < topo.from.length; e++) {
        const a = topo.from[e];
        const b = topo.to[e];
        const w = given ?? memberArea[e] * STEEL_UNIT_WEIGHT;
        const half = (w * Math.hypot(x[b] - x[a], y[b] - y[a])) / 2;
        out[at + 2 * a + 1] -= half;
        out[at + 2 * b + 1] -= half;
      }
    } else {
      const j = topo.nodeIds.indexOf(load.joint);
      if (j < 0) throw new RangeError(`point load at unknown joint ${load.joint}`);
      out[at + 2 * j] += value(load.fx, 'fx');
      out[at + 2 * j + 1] += value(load.fy, 'fy');
    }
  }
}

/**
 * The entries of a joint-load vector that `addCaseLoads` can write for `loads` on this topology,
 * ascending: chord joints' fy for area and line loads, member ends' fy for self-weight, both
 * components at a point load's joint. Every other entry stays zero whatever the geometry, so a
 * sweep combines the cases over these alone.
 */
export function loadedEntries(loads: readonly StudyLoad[], topo: FamilyTopology): Int32Array {
  const hit = new Uint8Array(2 * topo.nodeIds.length);
  for (const load of loads) {
    if (load.kind === 'area' || load.kind === 'line') {
      for (const j of load.chord === 'top' ? topo.topChord : topo.bottomChord) hit[2 * j + 1] = 1;
    } else if (load.kind === 'self-weight') {
      for (let e = 0; e < topo.from.length; e++) hit[2 * topo.from[e] + 1] = hit[2 * topo.to[e] + 1] = 1;
    } else {
      const j = topo.nodeIds.indexOf(load.joint);
      if (j >= 0) hit[2 * j] = hit[2 * j + 1] = 1;
    }
  }
  const out: number[] = [];
  hit.forEach((h, i) => h && out.push(i));
  return Int32Array.from(out);
}

/** Joint ids named by point loads that the topology does not have, in order of appearance. */
export function unknownJoints(loads: readonly StudyLoad[], topo: FamilyTopology): string[] {
  const known = new Set(topo.nodeIds);
  const out: string[] = [];
  for (const l of loads) if (l.kind === 'point' && !known.has(l.joint) && !out.includes(l.joint)) out.push(l.joint);
  return out;
}
