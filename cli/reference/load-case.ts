// Loading a reference case file: the case checked against its schema, then its model (inline, a
// model file beside it, or a study variant) checked and converted, every problem located as
// file:line:column and JSON path. A case that does not load is reported, never passed.
import { dirname, resolve } from 'node:path';
import { InputError, type Issue } from '../../shared/errors';
import { toStructure, type ModelCheck } from '../../shared/engine/to-structure';
import type { Structure } from '../../shared/engine/structure';
import { prefixIssues, validateCase, type CheckedCase, type ModelForm } from '../../shared/reference/validate-case';
import { findVariant, variantModel } from '../../shared/reference/variant-model';
import { resolveStudy } from '../../shared/sweep/resolve-study';
import { loadModelFile, readJsonFile, type JsonDocument } from '../io/read-json';
import { loadStudyFile } from '../sweep/load-study';

/** A case and its model, ready to recompute. */
export interface CaseModel { structure: Structure; units: ModelCheck['units'] }

/** A case file read: ready, or the problems that stop it (formatted, one per line). */
export type LoadedCase =
  | { ok: true; file: string; case: CheckedCase; model: CaseModel }
  | { ok: false; file: string; name?: string; problems: string };

const fail = (file: string, doc: JsonDocument, issues: Issue[]): never => {
  throw new InputError(file, issues.map((i) => ({ ...i, ...doc.locate(i.path) })));
};

/** A problem in a file the case names, reported at the key that names it. */
function nested(file: string, doc: JsonDocument, path: string, what: string, e: InputError): never {
  const at = doc.locate(path);
  const where = `${file}${at ? `:${at.line}:${at.column}` : ''} ${path}`;
  throw new InputError(undefined, [{ path: '', code: 'reference-nested', message: `${where}: ${what}\n${e.message.replace(/^/gm, '  ')}` }]);
}

function fromModel(file: string, doc: JsonDocument, data: unknown, prefix: string): CaseModel {
  const check = toStructure(data);
  if (!check.structure || check.issues.length) fail(file, doc, prefixIssues(prefix, check.issues));
  return { structure: check.structure!, units: check.units };
}

function studySetup(file: string, doc: JsonDocument, study: string | Record<string, unknown>) {
  if (typeof study === 'string') {
    try {
      return loadStudyFile(resolve(dirname(file), study));
    } catch (e) {
      if (e instanceof InputError) nested(file, doc, 'model.study', `the study file ${study} does not load`, e);
      throw e;
    }
  }
  const r = resolveStudy(study);
  if (!r.setup || r.issues.length) fail(file, doc, prefixIssues('model.study', r.issues.map((i) => ({ path: i.path, message: i.message, code: i.code ?? 'study-invalid' }))));
  return { setup: r.setup!, combinations: r.combinations };
}

function caseModel(file: string, doc: JsonDocument, form: ModelForm): CaseModel {
  if (form.kind === 'inline') return fromModel(file, doc, form.model, 'model');
  if (form.kind === 'file') {
    try {
      const m = loadModelFile(resolve(dirname(file), form.file));
      return { structure: m.structure, units: m.units };
    } catch (e) {
      if (e instanceof InputError) nested(file, doc, 'model.file', `the model file ${form.file} does not load`, e);
      throw e;
    }
  }
  const { setup, combinations } = studySetup(file, doc, form.study);
  const v = findVariant(setup, form.variant);
  if ('error' in v) return fail(file, doc, [{ path: 'model.variant', code: 'reference-variant', message: v.error }]);
  let model: unknown;
  try {
    model = variantModel(setup, combinations, v.params);
  } catch (e) {
    if (e instanceof RangeError) fail(file, doc, [{ path: 'model.variant', code: 'reference-variant', message: e.message }]);
    throw e;
  }
  return fromModel(file, doc, model, 'model');
}

/** Read, check and resolve one reference case file. */
export function loadCase(file: string): LoadedCase {
  let name: string | undefined;
  try {
    const doc = readJsonFile(file);
    const data = doc.data as { name?: unknown } | null;
    if (data && typeof data === 'object' && typeof data.name === 'string') name = data.name;
    const checked = validateCase(doc.data);
    if (!checked.case) return fail(file, doc, checked.issues);
    return { ok: true, file, case: checked.case, model: caseModel(file, doc, checked.case.model) };
  } catch (e) {
    if (e instanceof InputError) return { ok: false, file, ...(name !== undefined ? { name } : {}), problems: e.message };
    throw e;
  }
}
