/**
 * Method-of-sections probe in the browser: the model is analysed by the engine (cached), the
 * picked members are cut and the free body's three equations solved (shared/engine/sections.ts).
 * Forces come back in the model's force unit, beside the stiffness result for the same loading.
 */
import type { Model } from '@shared/schemas/model';
import { cutSection } from '@shared/engine/sections';
import { analyzeModel } from '@/lib/browser-analysis';

export interface ProbeRow {
  member: string;
  /** From the cut's statics, model force unit, tension positive. */
  statics: number;
  /** From the stiffness analysis of the same loading. */
  stiffness: number;
}

export type ProbeResult =
  | { ok: true; loading: string; rows: ProbeRow[]; freeBody: string[] }
  | { ok: false; message: string; freeBody?: string[] };

/** Cut `members` of `model` under `loading` (a combination or load case id). */
export function probeCut(model: Model, loading: string, members: readonly string[]): ProbeResult {
  if (!members.length) return { ok: false, message: 'Pick the members to cut: click them in the drawing or tick them in the table.' };
  const ba = analyzeModel(model);
  if (!ba.ok) return { ok: false, message: `The model has ${ba.issues.length} problem(s): ${ba.issues[0]?.message ?? ''}` };
  const { structure: st, analysis: an, units } = ba;
  const result = [...an.results, ...an.caseResults].find((r) => r.id === loading);
  if (!result) {
    return { ok: false, message: an.results.length ? `No loading called ${loading}.` : 'No forces: the frame is unstable, so a cut has nothing to balance.' };
  }
  const cut = members.map((id) => st.memberIds.indexOf(id));
  const missing = members.filter((_, k) => cut[k] < 0);
  if (missing.length) return { ok: false, message: `Unknown member(s): ${missing.join(', ')}.` };
  const n2 = 2 * st.nodeIds.length;
  const li = an.loadings.ids.indexOf(loading);
  const loads = li >= 0 ? an.loadings.loads.subarray(li * n2, (li + 1) * n2) : st.caseLoads[st.cases.indexOf(loading)];
  if (!loads) return { ok: false, message: `No loads for ${loading}.` };
  const r = cutSection(st, cut, loads, result.react);
  const freeBody = r.side.map((i) => st.nodeIds[i]);
  if (r.error || !r.forces) return { ok: false, message: `The cut cannot be solved: ${r.error ?? 'no result'}.`, freeBody };
  const F = units.forceFactor;
  return {
    ok: true,
    loading,
    freeBody,
    rows: cut.map((e, k) => ({ member: st.memberIds[e], statics: r.forces![k] / F, stiffness: result.forces[e] / F })),
  };
}
