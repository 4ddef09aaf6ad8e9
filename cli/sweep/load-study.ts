// Read a study file and resolve it, or throw InputError naming the file, line and JSON path.
import { InputError, type Issue } from '../../shared/errors';
import { resolveStudy, type ResolvedStudy } from '../../shared/sweep/resolve-study';
import { studyHash } from '../../shared/sweep/variant-id';
import { readJsonFile } from '../io/read-json';
import type { SweepSetup } from '../../shared/sweep/evaluate';

/** A study ready to sweep. */
export interface LoadedStudy {
  data: unknown;
  setup: SweepSetup;
  combinations: ResolvedStudy['combinations'];
  hash: string;
}

/** Load and check a study file. */
export function loadStudyFile(file: string): LoadedStudy {
  const doc = readJsonFile(file);
  const r = resolveStudy(doc.data);
  if (!r.setup || r.issues.length) {
    const issues: Issue[] = r.issues.map((i) => ({
      path: i.path,
      code: i.code ?? 'study-invalid',
      message: i.position !== undefined ? `${i.message.replace(/\s*\(char \d+\)/, '')} (at character ${i.position + 1} of the expression)` : i.message,
      ...doc.locate(i.path),
    }));
    throw new InputError(file, issues);
  }
  return { data: doc.data, setup: r.setup, combinations: r.combinations, hash: studyHash(doc.data as never) };
}
