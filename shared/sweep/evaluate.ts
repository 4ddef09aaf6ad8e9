/**
 * Evaluate study variants: generate the truss from its family, classify it by the pivot test,
 * analyse every combination and keep the peak figures. Per topology everything is built once;
 * per variant nothing but the record's own strings is allocated.
 */
import type { FamilyTopology, Params, TrussFamily } from '../families/types';
import type { StudyLoad } from '../schemas/study-loads';
import { createKernel, STATUS_DETERMINATE, STATUS_UNSTABLE, type Kernel } from '../engine/kernel';
import { classify } from '../engine/classify';
import type { Structure } from '../engine/structure';
import { addCaseLoads, loadedEntries } from '../families/loads';
import { variantAt, paramsFor, passes, type SpacePlan } from './space';
import { VariantIdHasher } from './variant-id';
import { ParamSlots } from './param-slots';
import type { PreparedDesign } from '../design/prepare';
import { emptyDesign, VariantSizer, type DesignFigures } from './evaluate-design';

/** Everything a sweep needs, resolved and checked. */
export interface SweepSetup {
  readonly family: TrussFamily;
  readonly plan: SpacePlan;
  /** Load case ids, in order. */
  readonly cases: readonly string[];
  /** Loads per case (quantities as numbers in kN/m², kN/m, m, kN). */
  readonly caseLoads: readonly (readonly StudyLoad[])[];
  /** Combinations with factors in case order. */
  readonly combinations: readonly { id: string; factors: Float64Array }[];
  /** Section of every member: A in m², E in kN/m² (the sizer's choice when `design` is set). */
  readonly section: { readonly A: number; readonly E: number };
  /** Member design, when the study sizes members. */
  readonly design?: PreparedDesign;
}

/** The figures of one variant; forces kN, lengths m. Reused between variants: copy what you keep. */
export interface VariantRecord {
  index: number;
  id: string;
  params: Params;
  status: 'unstable' | 'determinate' | 'indeterminate' | 'error';
  joints: number; members: number; reactions: number; k: number; s: number; critical: boolean;
  /** Largest tension over all combinations (kN, ≥ 0), its member and combination ('' when none). */
  peakTension: number; peakTensionMember: string; peakTensionCombination: string;
  /** Largest compression over all combinations (kN, ≤ 0), its member and combination. */
  peakCompression: number; peakCompressionMember: string; peakCompressionCombination: string;
  /** Largest joint displacement (m), its node and combination. */
  maxDisplacement: number; maxDisplacementNode: string; maxDisplacementCombination: string;
  /** Span over the largest vertical displacement (NaN when unstable or no deflection). */
  spanOverDeflection: number;
  /** Why a variant is unstable or failed ('' otherwise). */
  reason: string;
  /** Member design figures (status '' when the study does not size members). */
  design: DesignFigures;
}

interface TopoEntry {
  topo: FamilyTopology; kernel: Kernel; x: Float64Array; y: Float64Array; EA: Float64Array; area: Float64Array;
  caseBuf: Float64Array; loads: Float64Array; reasons: Map<string, string>; sizer?: VariantSizer;
  /** The load-vector entries any case can write (`loadedEntries`): the others stay zero. */
  loaded: Int32Array;
}

/** Evaluates variants of one study; one per worker thread. */
export class VariantEvaluator {
  private readonly topos = new Map<string, TopoEntry>();
  /** The topology of the last variant and the values of the parameters that decided it. */
  private lastTopo: TopoEntry | undefined;
  private readonly lastTopoValues: Params[string][] = [];
  private readonly scratch: Params;
  private readonly ids: VariantIdHasher;
  /** The values of the variant being evaluated, by index of `plan.paramNames` (see param-slots.ts). */
  readonly slots: ParamSlots;
  /** Index in `plan.paramNames` of each of the family's topology parameters (−1 when not one). */
  private readonly topoIndex: Int32Array;
  readonly record: VariantRecord = {
    index: 0, id: '', params: {}, status: 'error', joints: 0, members: 0, reactions: 0, k: 0, s: 0, critical: false,
    peakTension: 0, peakTensionMember: '', peakTensionCombination: '', peakCompression: 0, peakCompressionMember: '',
    peakCompressionCombination: '', maxDisplacement: 0, maxDisplacementNode: '', maxDisplacementCombination: '',
    spanOverDeflection: NaN, reason: '', design: emptyDesign(),
  };

  /** Loads per case as evaluated: without `self-weight` loads when the sizer supplies self-weight. */
  private readonly caseLoads: readonly (readonly StudyLoad[])[];
  /** Factor of the self-weight case in each combination (sizing only). */
  private readonly swFactor: Float64Array;

  constructor(readonly setup: SweepSetup) {
    this.scratch = paramsFor(setup.plan);
    this.slots = new ParamSlots(setup.plan, setup.plan.paramNames);
    this.ids = new VariantIdHasher(setup.family.id, setup.plan.paramNames, this.slots, setup.plan);
    this.topoIndex = Int32Array.from(setup.family.topologyParams, (n) => setup.plan.paramNames.indexOf(n));
    const d = setup.design;
    const sized = d !== undefined && d.selfWeight;
    this.caseLoads = sized ? setup.caseLoads.map((ls) => ls.filter((l) => l.kind !== 'self-weight')) : setup.caseLoads;
    // Self-weight goes to the case that held a self-weight load, else to D (dead), else nowhere.
    let sw = setup.caseLoads.findIndex((ls) => ls.some((l) => l.kind === 'self-weight'));
    if (sw < 0) sw = setup.cases.indexOf('D');
    this.swFactor = Float64Array.from(setup.combinations, (c) => (sized && sw >= 0 ? c.factors[sw] : 0));
  }

  /**
   * Evaluate variant `index`. @returns the (reused) record, or undefined when a `where` filter drops it
   */
  evaluate(index: number): VariantRecord | undefined {
    const { plan, family } = this.setup;
    const p = variantAt(plan, index, this.scratch, this.slots.digits);
    if (!passes(plan, p)) return undefined;
    this.slots.read(p);
    const r = this.record;
    r.index = index;
    r.params = p;
    r.id = this.ids.fromSlots(p);
    try {
      const problems = family.check(p);
      if (problems.length) return this.fail(problems.join('; '));
      this.run(p);
    } catch (e) {
      return this.fail(e instanceof Error ? e.message : String(e));
    }
    return r;
  }

  private fail(reason: string): VariantRecord {
    const r = this.record;
    if (this.setup.design) Object.assign(r.design, EMPTY_DESIGN); // unsized studies never change it
    r.status = 'error';
    r.joints = r.members = r.reactions = r.k = r.s = 0;
    r.critical = false;
    clearPeaks(r);
    r.reason = reason;
    return r;
  }

  private entry(p: Params): TopoEntry {
    // Most variants share the previous one's topology: compare the few parameters that decide it
    // before building the key.
    const at = this.topoIndex, values = this.slots.values, seen = this.lastTopoValues;
    let same = this.lastTopo !== undefined;
    for (let i = 0; same && i < at.length; i++) same = (at[i] >= 0 ? values[at[i]] : p[this.setup.family.topologyParams[i]]) === seen[i];
    if (same) return this.lastTopo!;
    const t = this.entryFor(p);
    for (let i = 0; i < at.length; i++) seen[i] = at[i] >= 0 ? values[at[i]] : p[this.setup.family.topologyParams[i]];
    this.lastTopo = t;
    return t;
  }

  private entryFor(p: Params): TopoEntry {
    const key = this.setup.family.topologyKey(p);
    let t = this.topos.get(key);
    if (!t) {
      const topo = this.setup.family.topology(p);
      const nJ = topo.nodeIds.length;
      const nM = topo.from.length;
      const nC = Math.max(1, this.setup.combinations.length);
      const { A, E } = this.setup.section;
      t = {
        topo, kernel: createKernel(topo, nC, { reactions: false }), x: new Float64Array(nJ), y: new Float64Array(nJ),
        EA: new Float64Array(nM).fill(E * A), area: new Float64Array(nM).fill(A),
        caseBuf: new Float64Array(this.setup.cases.length * 2 * nJ), loads: new Float64Array(nC * 2 * nJ), reasons: new Map(),
        loaded: loadedEntries(this.caseLoads.flat(), topo),
      };
      if (this.setup.design) t.sizer = new VariantSizer(this.setup.design, topo, t.kernel, this.swFactor);
      this.topos.set(key, t);
    }
    return t;
  }

  private run(p: Params): void {
    const r = this.record;
    const t = this.entry(p);
    const { topo, kernel, x, y } = t;
    this.setup.family.geometry(p, topo, x, y);
    const nJ = topo.nodeIds.length;
    const n2 = 2 * nJ;
    const { cases, combinations } = this.setup;
    const caseLoads = this.caseLoads;
    // Only the loaded entries are ever written, in both arrays: the rest stay zero from the start.
    const loads = t.loads, caseBuf = t.caseBuf, loaded = t.loaded, nL = loaded.length;
    for (let c = 0; c < cases.length; c++) {
      const co = c * n2;
      for (let k = 0; k < nL; k++) caseBuf[co + loaded[k]] = 0;
      addCaseLoads(caseLoads[c], topo, x, y, t.area, caseBuf, co);
    }
    for (let q = 0; q < combinations.length; q++) {
      const f = combinations[q].factors, lo = q * n2;
      for (let k = 0; k < nL; k++) {
        const i = loaded[k];
        let sum = 0;
        for (let c = 0; c < cases.length; c++) sum += f[c] * caseBuf[c * n2 + i];
        loads[lo + i] = sum;
      }
    }
    const nC = combinations.length;
    if (t.sizer) {
      t.sizer.size(x, y, t.loads, spanOf(p, t), combinations, r.design);
    } else {
      // r.design stays empty: only the sizer writes it
      kernel.run(x, y, t.EA, t.loads, nC);
    }
    r.joints = nJ;
    r.members = kernel.nMembers;
    r.reactions = kernel.nReactions;
    r.k = kernel.k;
    r.s = kernel.s;
    r.critical = kernel.k > 0 && kernel.nMembers + kernel.nReactions >= 2 * nJ;
    if (kernel.status === STATUS_UNSTABLE) {
      r.status = 'unstable';
      clearPeaks(r);
      if (t.sizer) Object.assign(r.design, EMPTY_DESIGN);
      r.reason = this.reasonFor(t, p);
      return;
    }
    r.status = kernel.status === STATUS_DETERMINATE ? 'determinate' : 'indeterminate';
    r.reason = '';
    this.peaks(t, p);
  }

  private peaks(t: TopoEntry, p: Params): void {
    const r = this.record;
    const { kernel, topo } = t;
    const nM = kernel.nMembers, nJ = kernel.nJoints;
    let tMax = 0, tE = -1, tC = 0, cMin = 0, cE = -1, cC = 0, uMax = -1, uN = 0, uC = 0, vMax = 0;
    const F = kernel.forces, D = kernel.disp;
    for (let c = 0; c < this.setup.combinations.length; c++) {
      for (let e = 0; e < nM; e++) {
        const N = F[c * nM + e];
        if (N > tMax) { tMax = N; tE = e; tC = c; }
        if (N < cMin) { cMin = N; cE = e; cC = c; }
      }
      for (let i = 0; i < nJ; i++) {
        const ux = D[c * 2 * nJ + 2 * i], uy = D[c * 2 * nJ + 2 * i + 1];
        const u = Math.sqrt(ux * ux + uy * uy);
        if (u > uMax) { uMax = u; uN = i; uC = c; }
        if (Math.abs(uy) > vMax) vMax = Math.abs(uy);
      }
    }
    const ids = topo.memberIds, combos = this.setup.combinations;
    r.peakTension = tMax; r.peakTensionMember = tE >= 0 ? ids[tE] : ''; r.peakTensionCombination = tE >= 0 ? combos[tC].id : '';
    r.peakCompression = cMin; r.peakCompressionMember = cE >= 0 ? ids[cE] : ''; r.peakCompressionCombination = cE >= 0 ? combos[cC].id : '';
    r.maxDisplacement = Math.max(0, uMax); r.maxDisplacementNode = combos.length ? topo.nodeIds[uN] : ''; r.maxDisplacementCombination = combos.length ? combos[uC].id : '';
    r.spanOverDeflection = vMax > 0 ? spanOf(p, t) / vMax : NaN;
  }

  /** Why a topology is unstable: classified in full once per topology and (k, s), then reused. */
  private reasonFor(t: TopoEntry, p: Params): string {
    const key = `${t.kernel.k}/${t.kernel.s}`;
    let why = t.reasons.get(key);
    if (why === undefined) {
      const st: Structure = {
        ...t.topo, name: this.setup.family.id, x: Float64Array.from(t.x), y: Float64Array.from(t.y), EA: t.EA,
        cases: [], caseLoads: [], combinations: [],
      };
      const c = classify(st);
      const order = ['reactions-parallel', 'reactions-concurrent', 'count-short', 'critical-form', 'flat-kink', 'joint-dangling', 'joint-unconnected', 'mechanism'];
      const picked = c.findings.filter((f) => f.level === 'error').sort((a, b) => order.indexOf(a.code) - order.indexOf(b.code)).slice(0, 2);
      why = picked.map((f) => f.message).join(' ') || `k = ${c.mechanisms} mechanism(s)`;
      void p;
      t.reasons.set(key, why);
    }
    return why;
  }
}

/** The design figures of a variant that is not sized (copied into the record, never changed). */
const EMPTY_DESIGN = Object.freeze(emptyDesign());

function clearPeaks(r: VariantRecord): void {
  r.peakTension = 0; r.peakTensionMember = ''; r.peakTensionCombination = '';
  r.peakCompression = 0; r.peakCompressionMember = ''; r.peakCompressionCombination = '';
  r.maxDisplacement = NaN; r.maxDisplacementNode = ''; r.maxDisplacementCombination = '';
  r.spanOverDeflection = NaN;
}

function spanOf(p: Params, t: TopoEntry): number {
  if (typeof p.span === 'number') return p.span;
  let lo = Infinity, hi = -Infinity;
  for (const v of t.x) { lo = Math.min(lo, v); hi = Math.max(hi, v); }
  return hi - lo;
}
