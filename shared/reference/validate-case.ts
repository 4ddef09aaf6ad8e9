/**
 * Checking a parsed reference case file. The case itself is checked against its schema with the
 * `model` left open; the model is then checked by its own form, so a mistake deep in an inline
 * model is reported at its own path (`model.members[3].to`) rather than as a failed union.
 */
import { Type } from '@sinclair/typebox';
import { ModelFileRef, ReferenceCase, VariantSpec, type ReferenceExpected, type ReferenceSource, type ReferenceTolerance } from '../schemas/reference-case';
import { compileSchema } from '../schemas/validate';
import type { Issue } from '../errors';

const CaseShell = Type.Object({ ...ReferenceCase.properties, model: Type.Unknown() }, { additionalProperties: false });
const StudyRefShell = Type.Object({ study: Type.Unknown(), variant: VariantSpec }, { additionalProperties: false });
const checkShell = compileSchema(CaseShell);
const checkFileRef = compileSchema(ModelFileRef);
const checkStudyRef = compileSchema(StudyRefShell);

/** How a case names its model; inline models and studies are checked when they are loaded. */
export type ModelForm =
  | { kind: 'inline'; model: unknown }
  | { kind: 'file'; file: string }
  | { kind: 'study'; study: string | Record<string, unknown>; variant: number | string };

/** A reference case whose own keys are valid (its model not yet checked). */
export interface CheckedCase {
  name: string;
  description?: string;
  source: ReferenceSource;
  model: ModelForm;
  expected: ReferenceExpected;
  tolerance: ReferenceTolerance;
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v);

/** Join a prefix path and a path inside it: `model` + `members[3].to` → `model.members[3].to`. */
export function prefixPath(prefix: string, path: string): string {
  if (!path) return prefix;
  if (!prefix) return path;
  return path.startsWith('[') ? `${prefix}${path}` : `${prefix}.${path}`;
}

/** Issues of one part of a document, moved under `prefix`. */
export function prefixIssues(prefix: string, issues: readonly Issue[]): Issue[] {
  return issues.map((i) => ({ ...i, path: prefixPath(prefix, i.path) }));
}

function modelForm(model: unknown, issues: Issue[]): ModelForm | undefined {
  if (!isObject(model)) {
    issues.push({ path: 'model', code: 'schema-type', message: 'must be a model object, { "file": ... } or { "study": ..., "variant": ... }' });
    return undefined;
  }
  if ('file' in model) {
    const found = prefixIssues('model', checkFileRef(model));
    issues.push(...found);
    return found.length ? undefined : { kind: 'file', file: model.file as string };
  }
  if ('study' in model) {
    const found = prefixIssues('model', checkStudyRef(model));
    const study = model.study;
    if (!(typeof study === 'string' && study.length > 0) && !isObject(study))
      found.push({ path: 'model.study', code: 'schema-type', message: 'must be a study file path or a study object' });
    issues.push(...found);
    return found.length ? undefined : { kind: 'study', study: study as string | Record<string, unknown>, variant: model.variant as number | string };
  }
  return { kind: 'inline', model };
}

/**
 * Check a parsed reference case file (everything but the inside of an inline model or study).
 * @returns the case, or the issues with dotted paths
 */
export function validateCase(data: unknown): { case?: CheckedCase; issues: Issue[] } {
  const issues = checkShell(data);
  if (!isObject(data)) return { issues };
  const form = 'model' in data ? modelForm(data.model, issues) : undefined;
  if (issues.length || !form) return { issues };
  const d = data as unknown as CheckedCase;
  return {
    case: { name: d.name, ...(d.description !== undefined ? { description: d.description } : {}), source: d.source, model: form, expected: d.expected, tolerance: d.tolerance },
    issues,
  };
}

/** True when a parsed JSON document looks like a reference case (it has `expected` and `tolerance`). */
export function looksLikeCase(data: unknown): boolean {
  return isObject(data) && 'expected' in data && 'tolerance' in data;
}
