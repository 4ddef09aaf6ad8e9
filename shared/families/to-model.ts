/**
 * A family variant as a model file object (units m, kN): joints and members with the family's
 * ids, one section, supports, joint loads per case and the combinations.
 */
import type { Model, ModelCombination, ModelLoad } from '../schemas/model';
import type { StudyLoad } from '../schemas/study-loads';
import { addCaseLoads } from './loads';
import { withDefaults } from './registry';
import type { Params, TrussFamily } from './types';

/** Section given to every member when none is stated: A m², E kN/m² (steel). */
export const DEFAULT_SECTION = { A: 0.005, E: 2.0e8 } as const;

/** Options of `buildModel`. Loads must have numeric quantities (kN/m², kN/m, m, kN). */
export interface BuildModelOptions {
  loads: StudyLoad[];
  combinations?: { id: string; factors: Record<string, number>; source?: string }[];
  name?: string;
  /** Section of every member: A in m², E in kN/m². Default DEFAULT_SECTION. */
  section?: { A: number; E: number };
}

/** Drop floating-point dust (0.30000000000000004 → 0.3) for a readable file. */
function tidy(v: number): number {
  const r = Number(v.toPrecision(12));
  return r === 0 ? 0 : r;
}

/**
 * Build a model file object for family `f` at `params` (defaults filled in).
 * Joint ids are the family's (B0.. bottom, T0.. top, M.., C, TIP); member ids are by group:
 * TC top chord, BC bottom chord, D diagonal, V vertical, L link, W web, numbered left to right.
 * Every member uses section "S1". Loads become joint loads per case, in the order cases first appear.
 * @throws RangeError when the parameters fail `f.check` (check them first)
 */
export function buildModel(f: TrussFamily, params: Params, opts: BuildModelOptions): Model {
  const p = withDefaults(f, params);
  const problems = f.check(p);
  if (problems.length) throw new RangeError(`${f.id}: ${problems.join('; ')}`);
  const topo = f.topology(p);
  const nJ = topo.nodeIds.length;
  const x = new Float64Array(nJ);
  const y = new Float64Array(nJ);
  f.geometry(p, topo, x, y);
  const section = opts.section ?? DEFAULT_SECTION;
  const area = new Float64Array(topo.from.length).fill(section.A);

  const loads: ModelLoad[] = [];
  const cases = [...new Set(opts.loads.map((l) => l.case))];
  for (const id of cases) {
    const out = new Float64Array(2 * nJ);
    addCaseLoads(opts.loads.filter((l) => l.case === id), topo, x, y, area, out);
    for (let j = 0; j < nJ; j++) {
      const fx = tidy(out[2 * j]);
      const fy = tidy(out[2 * j + 1]);
      if (fx === 0 && fy === 0) continue;
      loads.push({ case: id, node: topo.nodeIds[j], ...(fx !== 0 ? { fx } : {}), ...(fy !== 0 ? { fy } : {}) });
    }
  }
  const combinations: ModelCombination[] = (opts.combinations ?? []).map((c) => ({
    id: c.id, factors: { ...c.factors }, ...(c.source ? { source: c.source } : {}),
  }));
  const described = f.params.map((s) => `${s.name}=${p[s.name]}${s.unit && typeof p[s.name] === 'number' ? ` ${s.unit}` : ''}`);
  return {
    name: opts.name ?? `${f.name}, span ${p.span} m, ${p.panels} panels`,
    description: `Family ${f.id}: ${described.join(', ')}.`,
    units: { length: 'm', force: 'kN', area: 'm^2', modulus: 'kN/m^2' },
    nodes: topo.nodeIds.map((id, j) => ({ id, x: tidy(x[j]), y: tidy(y[j]) })),
    members: topo.memberIds.map((id, e) => ({
      id, from: topo.nodeIds[topo.from[e]], to: topo.nodeIds[topo.to[e]], section: 'S1', group: topo.groups[e],
    })),
    sections: [{ id: 'S1', A: section.A, E: section.E }],
    supports: topo.supports.map((s) => (s.kind === 'pin'
      ? { node: topo.nodeIds[s.node], type: 'pin' as const }
      : { node: topo.nodeIds[s.node], type: 'roller' as const, angle: tidy((s.angle * 180) / Math.PI) })),
    loads,
    combinations,
  };
}
