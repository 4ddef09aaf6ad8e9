/**
 * Size the members of one model (a Structure): the same sizer a sweep uses, driven by the model's
 * own loads and combinations; self-weight of the chosen sections joins load case D. Returns the
 * report and the structure as sized (E·A of the chosen sections, self-weight in D), ready for a
 * full analysis. Forces kN, lengths m.
 */
import type { Structure } from '../engine/structure';
import { createKernel } from '../engine/kernel';
import { loadVectors } from '../engine/load-vectors';
import type { Issue } from '../errors';
import type { PreparedDesign } from './prepare';
import { createSizer, type SizingState } from './size';
import { describeSizing, type SizingReport } from './size-report';

/** Outcome of sizing a model. */
export interface SizedStructure {
  report?: SizingReport;
  /** The structure with the sized sections and their self-weight; undefined when sizing failed. */
  structure?: Structure;
  issues: Issue[];
  /** The load case that carries self-weight ('' when none: no case D). */
  selfWeightCase: string;
}

/** Size a structure's members by their groups (members without a group form the group "web"). */
export function sizeStructure(st: Structure, design: PreparedDesign): SizedStructure {
  const nM = st.from.length, nJ = st.nodeIds.length, n2 = 2 * nJ;
  const groups = st.groups && st.groups.some(Boolean) ? st.groups.map((g) => g || 'web') : new Array<string>(nM).fill('web');
  const made = createSizer(design, { ids: st.memberIds, groups });
  if (!made.sizer) return { issues: made.issues, selfWeightCase: '' };
  const sizer = made.sizer;
  const loadings = loadVectors(st);
  const nL = loadings.ids.length;
  const swCase = design.selfWeight ? st.cases.indexOf('D') : -1;
  const swFactor = Float64Array.from(loadings.ids, (_, c) => (swCase < 0 ? 0 : loadings.kind === 'combination' ? st.combinations[c].factors[swCase] : c === swCase ? 1 : 0));
  const kernel = createKernel(st, nL);
  const length = Float64Array.from({ length: nM }, (_, e) => Math.hypot(st.x[st.to[e]] - st.x[st.from[e]], st.y[st.to[e]] - st.y[st.from[e]]));
  const swVec = new Float64Array(n2);
  const loads = new Float64Array(loadings.loads.length);
  const selfWeight = (state: SizingState) => {
    swVec.fill(0);
    for (let e = 0; e < nM; e++) {
      const half = (state.weight[e] * length[e]) / 2;
      swVec[2 * st.from[e] + 1] -= half;
      swVec[2 * st.to[e] + 1] -= half;
    }
  };
  let span = 0;
  for (const s of st.supports) for (const t of st.supports) span = Math.max(span, Math.abs(st.x[s.node] - st.x[t.node]));
  if (span === 0) for (let i = 0; i < nJ; i++) for (let k = 0; k < nJ; k++) span = Math.max(span, Math.abs(st.x[i] - st.x[k]));
  const r = sizer.size(length, span, (state) => {
    selfWeight(state);
    for (let c = 0; c < nL; c++) for (let i = 0; i < n2; i++) loads[c * n2 + i] = loadings.loads[c * n2 + i] + swFactor[c] * swVec[i];
    if (kernel.run(st.x, st.y, state.EA, loads, nL) > 0) return undefined;
    let v = 0;
    for (let i = 1; i < nL * n2; i += 2) v = Math.max(v, Math.abs(kernel.disp[i]));
    return { forces: kernel.forces, combinations: nL, maxDeflection: v };
  });
  const report = describeSizing(sizer, r, loadings.ids);
  if (r.status === 'analysis-failed') return { report, issues: report.issues, selfWeightCase: '' };
  selfWeight(sizer.state);
  const caseLoads = st.caseLoads.map((f, k) => (k === swCase ? f.map((v, i) => v + swVec[i]) : f));
  const structure: Structure = { ...st, EA: Float64Array.from(sizer.state.EA), caseLoads };
  return { report, structure, issues: report.issues, selfWeightCase: swCase >= 0 ? 'D' : '' };
}
