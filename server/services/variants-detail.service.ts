/**
 * One variant in full: its model rebuilt from the stored study and its parameters by the engine
 * the CLI sweeps with, analysed again, and the pushed figures checked against the new ones.
 */
import { analyze } from '../../shared/engine/analyze';
import { toStructure } from '../../shared/engine/to-structure';
import { variantModel } from '../../shared/reference/variant-model';
import { analysisJson, type AnalysisJson } from '../../shared/report/analysis-json';
import type { Model } from '../../shared/schemas/model';
import { resolveStudy, type ResolvedStudy } from '../../shared/sweep/resolve-study';
import { Run } from '../db/models/run.model';
import { Study } from '../db/models/study.model';
import type { ProjectAccess } from '../http/context';
import { notFound } from '../http/http-error';
import { findRun } from './runs.service';
import { checkFigures, checkRecord, type FigureCheck } from './variants-check';
import { VariantEvaluator } from '../../shared/sweep/evaluate';
import { ITEM_COLUMNS, marksOf, selectItems, type PublicMark, type VariantItem } from './variants-sql';

export interface VariantDetail {
  variant: VariantItem & { marks: PublicMark[] };
  /** The model file object (m, kN); null when the variant cannot be built (a failed variant). */
  model: Model | null;
  /** As `panelpoint analyze --json` gives it; null without a model. */
  analysis: AnalysisJson | null;
  check: FigureCheck;
}

// Resolving a study compiles its expressions: keep the last few (bodies never change for an id).
const resolvedCache = new Map<number, ResolvedStudy>();
function resolvedStudy(study: Study): ResolvedStudy {
  let r = resolvedCache.get(study.id);
  if (!r) {
    r = resolveStudy(study.body);
    if (resolvedCache.size >= 32) resolvedCache.delete(resolvedCache.keys().next().value!);
    resolvedCache.set(study.id, r);
  }
  return r;
}

/** Rebuild the model; a reason instead when the study or the parameters do not give one. */
function rebuild(study: Study, v: VariantItem): { model: Model } | { reason: string } {
  const resolved = resolvedStudy(study);
  if (!resolved.setup) return { reason: `the stored study does not resolve: ${resolved.issues.map((i) => `${i.path} ${i.message}`).join('; ')}` };
  try {
    return { model: variantModel(resolved.setup, resolved.combinations, v.params, `${study.name}, variant ${v.index} (${v.variantId})`) };
  } catch (e) {
    if (e instanceof RangeError) return { reason: e.message };
    throw e;
  }
}

const SIZED_NOTE = 'Checked against the sweep engine sizing this variant again. The drawing and member table below use the study\'s one section and its self-weight, not the sized sections: read the sized figures from the run\'s table.';

export async function variantDetail(access: ProjectAccess, runId: string, indexText: string): Promise<VariantDetail> {
  const run = await findRun(access, runId);
  const index = /^\d{1,9}$/.test(indexText) ? Number(indexText) : -1;
  const [item] = index < 0 ? [] : await selectItems(Run.sequelize!, `SELECT ${ITEM_COLUMNS} FROM variants v WHERE v.runPk = ? AND v.\`index\` = ?`, [run.id, index]);
  if (!item) throw notFound('variant-not-found', `Run ${run.runId} has no variant ${indexText}.`);
  const study = (await Study.findByPk(run.studyId))!;
  const marks = (await marksOf([item.pk])).get(item.pk) ?? [];
  const variant = { ...item, marks };
  const built = rebuild(study, item);
  if ('reason' in built) {
    const matches = item.status === 'error';
    return { variant, model: null, analysis: null, check: { matches, differences: matches ? [] : [{ field: 'model', stored: item.status, recomputed: null, message: built.reason }] } };
  }
  const checked = toStructure(built.model);
  if (!checked.structure) {
    const message = checked.issues.map((i) => `${i.path} ${i.message}`).join('; ');
    return { variant, model: built.model, analysis: null, check: { matches: false, differences: [{ field: 'model', stored: item.status, recomputed: null, message }] } };
  }
  const analysis = analysisJson(checked.structure, analyze(checked.structure), checked.units);
  // A sized study's figures come from the sections the sizer chose: check them against the sweep's
  // own evaluation of this variant, which sizes it again (the model shown keeps the study's section).
  const setup = resolvedStudy(study).setup!;
  const check = setup.design
    ? { ...checkRecord(item, new VariantEvaluator(setup).evaluate(item.index)), note: SIZED_NOTE }
    : checkFigures(item, analysis);
  return { variant, model: built.model, analysis, check };
}
