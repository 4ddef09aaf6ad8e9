/**
 * Auto-sizing: for each design group, the lightest catalogue section that passes every member and
 * combination, re-analysed with the chosen areas and self-weight until the choice stops changing.
 * Built once per topology (`createSizer`); `size` reuses its buffers. Forces kN, lengths m,
 * areas m², weights kN and kg.
 */
import type { Issue } from '../errors';
import type { PreparedDesign } from './prepare';
import { planGroups, type GroupPlan, type MemberSet } from './groups';
import { G_STANDARD } from './materials';
import { combineTerms, lengthTerms, TERMS } from './utilisation';
import { isCompressionCheck } from './check-names';
import { buildClasses, classEnvelope, createEnvelope, memberEnvelope } from './envelope';
import { sizeGroup, type Run } from './size-group';

/** Most analyses per `size` call. */
export const MAX_ITERATIONS = 10;

/** What the sizer hands the analysis: per member design area m², axial stiffness E·A kN, self-weight kN/m (0 when off). Reused. */
export interface SizingState {
  readonly area: Float64Array;
  readonly EA: Float64Array;
  readonly weight: Float64Array;
}

/** One analysis as the sizer reads it. */
export interface AnalysisView {
  /** Member forces per combination, kN, tension +: forces[c · members + e]. */
  readonly forces: Readonly<Float64Array>;
  readonly combinations: number;
  /** Largest vertical joint displacement over the combinations that count for deflection, m. */
  readonly maxDeflection?: number;
}

/** Analyse the truss with the state's sections; undefined when it cannot be analysed (unstable). */
export type Analyse = (state: SizingState) => AnalysisView | undefined;

/** Outcome of one `size` call; reused by the next call: copy what you keep. */
export interface SizingResult {
  /** sized: every group passes and the choice settled; unsizable: a group has no passing section. */
  status: 'sized' | 'unsizable' | 'not-settled' | 'analysis-failed';
  settled: boolean;
  /** Analyses run. */
  iterations: number;
  /** Per member: catalogue section index (into design.catalogue.sections), utilisation, check id, combination (−1: none). */
  readonly section: Int32Array;
  readonly utilisation: Float64Array;
  readonly check: Uint8Array;
  readonly combination: Int32Array;
  /** Per design group: section index, 1 when it passes, member with the largest utilisation. */
  readonly groupSection: Int32Array;
  readonly groupOk: Uint8Array;
  readonly groupWorst: Int32Array;
  /** Σ length × area × unit weight, kN (area for weight: nominal wall); and the same as mass, kg. */
  weight: number;
  mass: number;
  maxUtilisation: number;
  maxUtilisationMember: number;
  /** Largest vertical displacement, m (NaN when not given), span over it, and the check against span/limit. */
  maxDeflection: number;
  spanOverDeflection: number;
  deflectionOk: boolean | undefined;
}

/** A reusable sizer for one topology. */
export interface Sizer {
  readonly design: PreparedDesign;
  readonly members: MemberSet;
  readonly plan: GroupPlan;
  /** The sections of the last analysis: the result's sections once it settled. */
  readonly state: SizingState;
  readonly result: SizingResult;
  /**
   * Size one variant. @param length - member lengths, m; @param span - for the deflection ratio, m
   * @param analyse - re-analyses with `state` (called 1..MAX_ITERATIONS times)
   */
  size(length: Readonly<Float64Array>, span: number, analyse: Analyse): SizingResult;
}

/** Build a sizer. @returns the sizer, or issues from the spec's groups and unbraced lengths */
export function createSizer(design: PreparedDesign, members: MemberSet): { sizer?: Sizer; issues: Issue[] } {
  const g = planGroups(design.spec, members);
  if (!g.plan) return { issues: g.issues };
  const plan = g.plan;
  const nM = members.ids.length, nG = plan.names.length;
  const state: SizingState = { area: new Float64Array(nM), EA: new Float64Array(nM), weight: new Float64Array(nM) };
  const result: SizingResult = {
    status: 'analysis-failed', settled: false, iterations: 0,
    section: new Int32Array(nM), utilisation: new Float64Array(nM), check: new Uint8Array(nM), combination: new Int32Array(nM),
    groupSection: new Int32Array(nG), groupOk: new Uint8Array(nG), groupWorst: new Int32Array(nG),
    weight: 0, mass: 0, maxUtilisation: 0, maxUtilisationMember: -1, maxDeflection: NaN, spanOverDeflection: NaN, deflectionOk: undefined,
  };
  const run: Run = {
    design, plan, env: createEnvelope(nM, nG), state, result, next: new Int32Array(nG), chk: new Int32Array(1),
    hint: new Int32Array(nG), terms: new Float64Array(TERMS * nM),
  };
  const sizer: Sizer = { design, members, plan, state, result, size: (length, span, analyse) => size(run, length, span, analyse) };
  return { sizer, issues: [] };
}

function size(p: Run, length: Readonly<Float64Array>, span: number, analyse: Analyse): SizingResult {
  const { plan, env, result: r, next } = p;
  buildClasses(env, plan, length);
  const cur = r.groupSection;
  cur.fill(0);
  r.settled = false;
  let view: AnalysisView | undefined;
  for (r.iterations = 0; r.iterations < MAX_ITERATIONS; ) {
    setState(p, cur);
    view = analyse(p.state);
    r.iterations++;
    if (!view) {
      r.status = 'analysis-failed';
      return r;
    }
    memberEnvelope(env, view.forces, view.combinations);
    classEnvelope(env);
    let changed = false;
    for (let g = 0; g < plan.names.length; g++) {
      next[g] = sizeGroup(p, g);
      if (next[g] !== cur[g]) changed = true;
    }
    cur.set(next);
    if (!changed) {
      r.settled = true;
      break;
    }
  }
  finish(p, length, span, view!);
  return r;
}

/** Areas, stiffness and self-weight per member from each group's section. */
function setState(p: Run, sections: Int32Array): void {
  const { design: d, plan, state } = p;
  const E = d.rules.E, gamma = d.selfWeight ? d.material.unitWeight : 0;
  const A = d.catalogue.A, massArea = d.catalogue.massArea, groupOf = plan.groupOf, area = state.area, EA = state.EA, weight = state.weight;
  for (let e = 0; e < groupOf.length; e++) {
    const s = sections[groupOf[e]];
    const a = A[s];
    area[e] = a;
    EA[e] = E * a;
    weight[e] = massArea[s] * gamma;
  }
}

/** Per member utilisation, check and combination on the chosen sections; weight, peaks, deflection. */
function finish(p: Run, length: Readonly<Float64Array>, span: number, view: AnalysisView): void {
  const { design: d, plan, env, result: r, chk, terms } = p;
  const groupSection = r.groupSection, classStart = env.classStart;
  // The length terms (buckling strength, slenderness) once per class, then each member's forces.
  for (let g = 0; g < plan.names.length; g++) {
    for (let k = classStart[g]; k < classStart[g + 1]; k++) lengthTerms(d, groupSection[g], env.clsLin[k], env.clsLout[k], terms, TERMS * k);
  }
  const massArea = d.catalogue.massArea, groupOf = plan.groupOf, T = env.T, C = env.C, classOf = env.classOf;
  const section = r.section, util = r.utilisation, check = r.check, combination = r.combination, worst = r.groupWorst;
  let W = 0, maxU = -1, maxE = -1;
  worst.fill(-1);
  for (let e = 0; e < groupOf.length; e++) {
    const g = groupOf[e];
    const s = groupSection[g];
    const u = combineTerms(d, s, T[e], C[e], T[e] > 0 || C[e] <= 0, terms, TERMS * classOf[e], chk);
    section[e] = s;
    util[e] = u;
    check[e] = chk[0];
    combination[e] = isCompressionCheck(chk[0]) ? env.Cc[e] : env.Tc[e];
    if (u > maxU) { maxU = u; maxE = e; }
    const w = worst[g];
    if (w < 0 || u > util[w]) worst[g] = e;
    W += length[e] * massArea[s];
  }
  W *= d.material.unitWeight;
  r.maxUtilisation = maxU;
  r.maxUtilisationMember = maxE;
  r.weight = W;
  r.mass = (W * 1000) / G_STANDARD;
  let ok = true;
  for (let g = 0; g < plan.names.length; g++) if (!r.groupOk[g]) ok = false;
  r.status = !ok ? 'unsizable' : r.settled ? 'sized' : 'not-settled';
  const defl = view.maxDeflection;
  r.maxDeflection = defl === undefined ? NaN : defl;
  r.spanOverDeflection = defl === undefined ? NaN : defl > 0 ? span / defl : Infinity;
  r.deflectionOk = d.deflectionLimit === undefined || defl === undefined ? undefined : r.spanOverDeflection >= d.deflectionLimit;
}
