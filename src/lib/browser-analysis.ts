/**
 * The engine in the browser, for the pages that draw or probe a truss without the server:
 * model → Structure (toStructure) → Analysis (analyze) → the same JSON the CLI prints.
 * Results are cached per model object, so a page and its probe share one analysis.
 */
import { toStructure } from '@shared/engine/to-structure';
import { analyze, type Analysis } from '@shared/engine/analyze';
import { analysisJson, type AnalysisJson, type OutputUnits } from '@shared/report/analysis-json';
import type { Structure } from '@shared/engine/structure';
import type { Issue } from '@shared/errors';

export type BrowserAnalysis =
  | { ok: true; structure: Structure; analysis: Analysis; json: AnalysisJson; units: OutputUnits }
  | { ok: false; issues: Issue[] };

const cache = new WeakMap<object, BrowserAnalysis>();

/** Check and analyse a parsed model file; issues instead of a result when the model is invalid. */
export function analyzeModel(model: object): BrowserAnalysis {
  const hit = cache.get(model);
  if (hit) return hit;
  const check = toStructure(model);
  let out: BrowserAnalysis;
  if (!check.structure) out = { ok: false, issues: check.issues };
  else {
    const analysis = analyze(check.structure);
    out = { ok: true, structure: check.structure, analysis, units: check.units, json: analysisJson(check.structure, analysis, check.units) };
  }
  cache.set(model, out);
  return out;
}
