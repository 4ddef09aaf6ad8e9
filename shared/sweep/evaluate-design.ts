/**
 * Member design inside a sweep: size every variant's member groups from the catalogue, feeding
 * the chosen sections' stiffness and self-weight back into the analysis until the choice settles.
 * Built once per topology; per variant it allocates only the short text of the chosen sections.
 */
import type { FamilyTopology } from '../families/types';
import type { Kernel } from '../engine/kernel';
import type { PreparedDesign } from '../design/prepare';
import { createSizer, type AnalysisView, type Sizer, type SizingResult, type SizingState } from '../design/size';
import { checkName } from '../design/check-names';
import { sizingIssues } from '../design/size-report';

/** Design figures of one variant (reused between variants). */
export interface DesignFigures {
  status: SizingResult['status'] | '';
  /** Total weight, kN, and mass, kg, of the sized truss. */
  weight: number;
  mass: number;
  maxUtilisation: number;
  maxUtilisationMember: string;
  governingCheck: string;
  governingCombination: string;
  deflectionOk: boolean | undefined;
  /** Chosen section per design group, "group=section; ...". */
  sections: string;
  reason: string;
}

/** An empty figure set (no design, or a variant that is not sized). */
export function emptyDesign(): DesignFigures {
  return { status: '', weight: NaN, mass: NaN, maxUtilisation: NaN, maxUtilisationMember: '', governingCheck: '', governingCombination: '', deflectionOk: undefined, sections: '', reason: '' };
}

/** Per topology: the sizer and the buffers its analyses use. */
export class VariantSizer {
  private readonly sizer: Sizer;
  private readonly swVec: Float64Array;
  private readonly loads: Float64Array;
  private readonly lengths: Float64Array;
  private readonly view: { forces: Readonly<Float64Array>; combinations: number; maxDeflection: number } = { forces: new Float64Array(0), combinations: 0, maxDeflection: 0 };
  private x!: Float64Array;
  private y!: Float64Array;
  private base!: Float64Array;

  /**
   * @param swFactor - factor of the self-weight case in each combination (0 when self-weight is off)
   */
  constructor(design: PreparedDesign, private readonly topo: FamilyTopology, private readonly kernel: Kernel, private readonly swFactor: Float64Array) {
    const made = createSizer(design, { ids: topo.memberIds, groups: topo.groups });
    if (!made.sizer) throw new Error(made.issues.map((i) => `${i.path}: ${i.message}`).join('; '));
    this.sizer = made.sizer;
    this.swVec = new Float64Array(2 * topo.nodeIds.length);
    this.loads = new Float64Array(swFactor.length * 2 * topo.nodeIds.length);
    this.lengths = new Float64Array(topo.from.length);
  }

  private readonly analyse = (state: SizingState): AnalysisView | undefined => {
    const { topo, kernel, swVec, loads, base, swFactor } = this;
    const n2 = swVec.length;
    swVec.fill(0);
    for (let e = 0; e < topo.from.length; e++) {
      const half = (state.weight[e] * kernel.length[e]) / 2;
      swVec[2 * topo.from[e] + 1] -= half;
      swVec[2 * topo.to[e] + 1] -= half;
    }
    for (let c = 0; c < swFactor.length; c++) {
      const f = swFactor[c];
      for (let i = 0; i < n2; i++) loads[c * n2 + i] = base[c * n2 + i] + f * swVec[i];
    }
    if (kernel.run(this.x, this.y, state.EA, loads, swFactor.length) > 0) return undefined;
    let v = 0;
    const D = kernel.disp;
    for (let i = 1; i < swFactor.length * n2; i += 2) if (Math.abs(D[i]) > v) v = Math.abs(D[i]);
    this.view.forces = kernel.forces;
    this.view.combinations = swFactor.length;
    this.view.maxDeflection = v;
    return this.view;
  };

  /**
   * Size one variant; the kernel holds the final analysis afterwards.
   * @param base - combination loads without self-weight, kN; @param span - m
   */
  size(x: Float64Array, y: Float64Array, base: Float64Array, span: number, combos: readonly { id: string }[], out: DesignFigures): SizingResult {
    this.x = x; this.y = y; this.base = base;
    const { from, to } = this.topo;
    for (let e = 0; e < from.length; e++) this.lengths[e] = Math.hypot(x[to[e]] - x[from[e]], y[to[e]] - y[from[e]]);
    const r = this.sizer.size(this.lengths, span, this.analyse);
    const d = this.sizer.design;
    const secs = d.catalogue.sections;
    out.status = r.status;
    const failed = r.status === 'analysis-failed';
    out.weight = failed ? NaN : r.weight;
    out.mass = failed ? NaN : r.mass;
    out.maxUtilisation = failed ? NaN : r.maxUtilisation;
    const m = r.maxUtilisationMember;
    out.maxUtilisationMember = failed || m < 0 ? '' : this.topo.memberIds[m];
    out.governingCheck = failed || m < 0 ? '' : checkName(d.rules.code, r.check[m]);
    out.governingCombination = failed || m < 0 || r.combination[m] < 0 ? '' : combos[r.combination[m]].id;
    out.deflectionOk = failed ? undefined : r.deflectionOk;
    let text = '';
    if (!failed) this.sizer.plan.names.forEach((name, g) => (text += `${g ? '; ' : ''}${name}=${secs[r.groupSection[g]].name}`));
    out.sections = text;
    out.reason = r.status === 'sized' ? '' : sizingIssues(this.sizer, r).map((i) => i.message).join(' ');
    return r;
  }
}
