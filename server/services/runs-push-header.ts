/**
 * The first line of a push: checked against its schema, its study resolved by the same code the
 * CLI sweeps with (a run whose study does not resolve could not be recomputed), and its hash
 * checked against the body, so a run is always stored with the study that made it.
 */
import { getFamily } from '../../shared/families/registry';
import { resolveStudy } from '../../shared/sweep/resolve-study';
import { studyHash } from '../../shared/sweep/variant-id';
import { compileSchema } from '../../shared/schemas/validate';
import { Study, type Study as StudyFile } from '../../shared/schemas/study';
import { HttpError, type ErrorDetail } from '../http/http-error';
import { RunLine } from '../schemas/runs';

const checkRunLine = compileSchema(RunLine);

/**
 * Compile the validators every push runs, now rather than on the first push: Ajv generates each
 * one's code on first use (≈ 0.13 s for these two, most of it the study schema, which
 * resolveStudy then finds compiled), and the first push after the server starts would hold its
 * upload meanwhile. Called when the runs routes are mounted.
 */
export function compilePushValidators(): void {
  checkRunLine(undefined);
  compileSchema(Study)(undefined);
}

/** A checked first line, with the run's key on the server and the numeric parameters. */
export interface PushHeader {
  line: RunLine;
  /** manifest.runId for an unsharded run; `${study hash}/${shard count}` for shards, which merge into one run. */
  key: string;
  numeric: (name: string) => boolean;
}

const invalid = (message: string, details: ErrorDetail[]) => new HttpError(422, 'invalid-run', message, details);

/** The server's key of a pushed run. */
export function runKey(m: RunLine['manifest']): string {
  return m.shard.count === 1 ? m.runId : `${m.study.hash}/${m.shard.count}`;
}

export function checkHeader(data: unknown): PushHeader {
  if ((data as { kind?: unknown } | null)?.kind !== 'run') {
    throw invalid('The first line of a push must be the run line ({"kind":"run",...}).', [{ path: 'line 1 kind', message: 'must be "run"' }]);
  }
  const issues = checkRunLine(data);
  if (issues.length) throw invalid('The run line of the push is not valid.', issues.map((i) => ({ path: `line 1 ${i.path}`.trim(), message: i.message })));
  const line = data as RunLine;
  const { manifest: m, study } = line;
  const at = (path: string, message: string) => ({ path: `line 1 ${path}`, message });
  const details: ErrorDetail[] = [];
  const hash = studyHash(study.body as StudyFile);
  if (hash !== study.hash) details.push(at('study.hash', `is ${study.hash}, but the study body hashes to ${hash}`));
  if (m.study.hash !== study.hash) details.push(at('manifest.study.hash', `is ${m.study.hash}, but the study sent is ${study.hash}`));
  if (m.study.family !== study.family || (study.body as { family?: unknown }).family !== study.family) details.push(at('study.family', 'must match the manifest and the study body'));
  if (m.shard.index > m.shard.count) details.push(at('manifest.shard.index', `must be at most the shard count ${m.shard.count}`));
  if (m.range.end < m.range.start || m.range.end > m.spaceSize) details.push(at('manifest.range', `must lie inside 0..${m.spaceSize}`));
  if (details.length) throw invalid('The run line of the push does not hold together.', details);

  const resolved = resolveStudy(study.body);
  if (!resolved.setup || resolved.issues.length) {
    throw invalid('The study of the push does not resolve.', resolved.issues.map((i) => at(`study.body${i.path ? '.' + i.path : ''}`, i.message)));
  }
  const family = getFamily(study.family)!;
  const unknown = m.paramNames.filter((n) => !family.params.some((p) => p.name === n));
  if (unknown.length) throw invalid('The run names parameters its family does not have.', [at('manifest.paramNames', `unknown: ${unknown.join(', ')}`)]);
  const numeric = (name: string) => family.params.some((p) => p.name === name && p.options === undefined);
  return { line, key: runKey(m), numeric };
}
