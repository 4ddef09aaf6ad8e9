/**
 * A reference case body as the server keeps it: valid by shared/reference/validate-case.ts, and
 * self-contained. An inline model is checked by shared/engine/to-structure.ts and a study object
 * by shared/sweep/resolve-study.ts with its variant found; a `{ file }` or a study path is
 * refused, as the server cannot read the files next to someone's case.
 */
import type { Issue } from '../../shared/errors';
import { toStructure } from '../../shared/engine/to-structure';
import { prefixIssues, prefixPath, validateCase, type CheckedCase } from '../../shared/reference/validate-case';
import { findVariant } from '../../shared/reference/variant-model';
import { resolveStudy } from '../../shared/sweep/resolve-study';
import { HttpError } from '../http/http-error';

const invalid = (issues: readonly Pick<Issue, 'path' | 'message'>[]) =>
  new HttpError(422, 'invalid-case', 'The reference case is not valid.', issues.map(({ path, message }) => ({ path, message })));

function modelIssues(c: CheckedCase): Pick<Issue, 'path' | 'message'>[] {
  const form = c.model;
  if (form.kind === 'file') return [{ path: 'model.file', message: 'a case kept on the server carries its model inline: the server cannot read files beside the case' }];
  if (form.kind === 'inline') return prefixIssues('model', toStructure(form.model).issues);
  if (typeof form.study === 'string') return [{ path: 'model.study', message: 'a case kept on the server carries its study inline: the server cannot read study files' }];
  const r = resolveStudy(form.study);
  if (!r.setup || r.issues.length) return r.issues.map((i) => ({ path: prefixPath('model.study', i.path), message: i.message }));
  const v = findVariant(r.setup, form.variant);
  return 'error' in v ? [{ path: 'model.variant', message: v.error }] : [];
}

/** Check a case body; 422 with the paths of every problem. */
export function checkCaseBody(body: unknown): CheckedCase {
  const { case: c, issues } = validateCase(body);
  if (!c) throw invalid(issues);
  const more = modelIssues(c);
  if (more.length) throw invalid(more);
  return c;
}
