/** Runs of a project: the list (optionally of one study), one run in detail, and the lookup by key. */
import { Run, type ParamColumns } from '../db/models/run.model';
import { Study } from '../db/models/study.model';
import { User } from '../db/models/user.model';
import type { ProjectAccess } from '../http/context';
import { HttpError, notFound } from '../http/http-error';
import { publicShards, shardsOf, type PublicShard } from './runs-shards';
import type { SweepSummary } from '../../shared/sweep/summary';

export interface PublicRun {
  runId: string;
  study: { id: number; name: string; family: string };
  pushedBy: { id: number; name: string } | null;
  pushedAt: Date;
  updatedAt: Date;
  cliVersion: string;
  gitCommit: string | null;
  status: string;
  variantCount: number;
  byStatus: SweepSummary['byStatus'] | null;
  shards: PublicShard[];
}

export interface RunDetail extends PublicRun {
  summary: SweepSummary | null;
  paramNames: string[];
  paramColumns: ParamColumns;
  combinations: { id: string; factors: Record<string, number>; source: string }[];
  spaceSize: number | null;
}

const include = [
  { model: Study, as: 'study', attributes: ['id', 'name', 'family'] },
  { model: User, as: 'pusher', attributes: ['id', 'name'] },
];

/** A run loaded with `include` (the Run model does not declare its associations). */
type RunWith = Run & { study?: Study; pusher?: User | null };

function publicRun(r: RunWith): PublicRun {
  const s = r.study!;
  const pusher = r.pusher;
  return {
    runId: r.runId, study: { id: s.id, name: s.name, family: s.family }, pushedBy: pusher ? { id: pusher.id, name: pusher.name } : null,
    pushedAt: r.pushedAt, updatedAt: r.updatedAt, cliVersion: r.cliVersion, gitCommit: r.gitCommit, status: r.status,
    variantCount: r.variantCount, byStatus: (r.summary as SweepSummary | null)?.byStatus ?? null, shards: publicShards(r.shards),
  };
}

/** The project's runs, newest first; `study` narrows to one study id. */
export async function listRuns(access: ProjectAccess, study: unknown): Promise<PublicRun[]> {
  const where: { projectId: number; studyId?: number } = { projectId: access.project.id };
  if (study !== undefined) {
    if (typeof study !== 'string' || !/^\d{1,10}$/.test(study)) {
      throw new HttpError(422, 'invalid-query', 'The query is not valid.', [{ path: 'study', message: 'must be a study id (a whole number)' }]);
    }
    where.studyId = Number(study);
  }
  const runs = await Run.findAll({ where, include, order: [['pushedAt', 'DESC'], ['id', 'DESC']] });
  return runs.map(publicRun);
}

/** The run `runId` of the project (a shard run's key holds a slash: encode it in the URL); 404 otherwise. */
export async function findRun(access: ProjectAccess, runId: string): Promise<Run> {
  const run = runId.length <= 36 ? await Run.findOne({ where: { runId, projectId: access.project.id }, include }) : null;
  if (!run || run.status === 'receiving') throw notFound('run-not-found', 'No such run in this project.');
  return run;
}

export async function runDetail(access: ProjectAccess, runId: string): Promise<RunDetail> {
  const run = await findRun(access, runId);
  const first = shardsOf(run.shards)[0];
  return {
    ...publicRun(run), summary: run.summary as SweepSummary | null, paramNames: first?.paramNames ?? [],
    paramColumns: run.paramColumns, combinations: first?.combinations ?? [], spaceSize: first?.spaceSize ?? null,
  };
}
