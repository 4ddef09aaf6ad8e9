/**
 * Assemble a `TrussFamily` from its pattern: the builder of its joints and members, the two
 * outlines that place them, and its parameter rules. Lengths in metres.
 */
import { fillLayout, type LaidOutTopology, type Outline } from './builder';
import { ROLLER_ANGLE, SLOPE, checkPanels, checkParams, num, opt, supportsKey } from './params';
import type { FamilyTopology, ParamSpec, Params, TrussFamily } from './types';

/** What a family file states; everything else is common. */
export interface FamilyDef {
  id: string;
  name: string;
  category: TrussFamily['category'];
  summary: string;
  params: readonly ParamSpec[];
  /** The `panels` parameter and its parity or set rule. */
  panels: ParamSpec;
  panelRule?: 'even' | 'odd' | readonly number[];
  /** The span parameter (x = xi · span). */
  span: ParamSpec;
  /** Family-specific checks beyond ranges and the panel rule. */
  extraCheck?: (p: Params) => string[];
  /** A topology-changing option parameter beyond panels and supports. */
  extraKey?: ParamSpec;
  /** Build the topology for a valid, whole panel count. */
  build: (p: Params, panels: number) => LaidOutTopology;
  /** Write the shape constants the outlines read (depth, rise...) into k (length 8). No allocation. */
  prepare: (p: Params, k: Float64Array) => void;
  /** Height of the top and bottom outlines, metres, at xi = x / span. */
  top: Outline;
  bottom: Outline;
}

/** The family object for a definition. */
export function defineFamily(d: FamilyDef): TrussFamily {
  // Shape constants, read once per variant rather than once per joint.
  const k = new Float64Array(8);
  const supports = d.params.find((s) => s.name === 'supports');
  return {
    id: d.id,
    name: d.name,
    category: d.category,
    summary: d.summary,
    params: d.params,
    topologyParams: [d.panels.name, ...(supports ? [supports.name, ROLLER_ANGLE.name] : []), ...(d.extraKey ? [d.extraKey.name] : [])],
    check(p: Params): string[] {
      // A slope above 0 replaces rise, whose own range then does not apply (checkRise covers it).
      const slopeSet = d.params.includes(SLOPE) && num(p, SLOPE) > 0;
      const basic = checkParams(slopeSet ? d.params.filter((s) => s.name !== 'rise') : d.params, p);
      if (basic.length) return basic;
      const panels = d.panelRule ? checkPanels(p, d.panels, d.panelRule) : basic;
      const extra = d.extraCheck ? d.extraCheck(p) : basic;
      // called for every variant of a sweep: no new array when all is well
      return extra.length === 0 ? panels : panels.length === 0 ? extra : [...panels, ...extra];
    },
    topologyKey(p: Params): string {
      // called for every variant of a sweep: plain concatenation, no array
      let key = `${d.id}|n=${num(p, d.panels)}`;
      if (supports) key += `|${supportsKey(p, supports)}`;
      if (d.extraKey) key += `|${opt(p, d.extraKey)}`;
      return key;
    },
    topology(p: Params): FamilyTopology {
      const n = num(p, d.panels);
      if (!Number.isInteger(n) || n < (d.panels.min ?? 1)) throw new RangeError(`${d.id}: panels must be a whole number ≥ ${d.panels.min} (got ${n})`);
      return d.build(p, n);
    },
    geometry(p: Params, topo: FamilyTopology, x: Float64Array, y: Float64Array): void {
      d.prepare(p, k);
      fillLayout(topo, num(p, d.span), k, d.top, d.bottom, x, y);
    },
  };
}
