/**
 * Check results pushed by `panelpoint check --push`, and their history per case. A case that
 * goes from passing (or from no result) to failing mails the project's engineers once; further
 * failures of the same case stay quiet until it passes again. Pushes that name the same cases
 * are serialised by locking the case rows, so two concurrent pushes cannot both mail.
 */
import type { ResolvedDeps } from '../app-deps';
import { CheckResult, type CheckStatus } from '../db/models/check-result.model';
import { ReferenceCase } from '../db/models/reference-case.model';
import { User } from '../db/models/user.model';
import type { ProjectAccess } from '../http/context';
import { HttpError, notFound } from '../http/http-error';
import type { CheckPush } from '../schemas/checks';
import { audit } from './audit.service';
import { latestResults } from './cases.service';
import { notifyChecksFailed, type FailedCheck } from './notify';

/** How `details` is kept in check_results: the file and pusher beside what the CLI sent. */
interface StoredDetails { file: string; pushedBy: number | null; report: unknown }

export interface RecordedChecks {
  recorded: number;
  results: { caseName: string; status: string; previous: string | null }[];
  /** Cases that started failing with this push (mailed). */
  newlyFailing: string[];
  /** Addresses the failure notice went to. */
  notified: string[];
}

export async function recordChecks(deps: ResolvedDeps, actor: User, access: ProjectAccess, items: CheckPush): Promise<RecordedChecks> {
  const { project } = access;
  const names = [...new Set(items.map((i) => i.caseName))];
  const outcome = await deps.sequelize.transaction(async (transaction) => {
    const cases = await ReferenceCase.findAll({ where: { projectId: project.id, name: names }, lock: transaction.LOCK.UPDATE, transaction });
    const byName = new Map(cases.map((c) => [c.name, c]));
    const unknown = items.flatMap((it, i) => (byName.has(it.caseName) ? [] : [{ path: `[${i}].caseName`, message: `no reference case named ${JSON.stringify(it.caseName)} in this project` }]));
    if (unknown.length) throw new HttpError(422, 'unknown-case', 'Some results name reference cases the project does not have: create them first (POST /cases).', unknown);
    const last = await latestResults(cases.map((c) => c.id), transaction);
    const state = new Map(cases.map((c) => [c.id, last.get(c.id) ?? null] as const));
    const failures: FailedCheck[] = [];
    const results: RecordedChecks['results'] = [];
    for (const it of items) {
      const c = byName.get(it.caseName)!;
      const before = state.get(c.id) ?? null;
      if (it.status !== 'pass' && (!before || before.status === 'pass')) {
        failures.push({
          caseName: c.name, file: it.file, status: it.status, details: it.details ?? null, gitCommit: it.gitCommit ?? null,
          lastPass: before ? { gitCommit: before.gitCommit, at: before.createdAt } : null,
        });
      }
      results.push({ caseName: c.name, status: it.status, previous: before?.status ?? null });
      state.set(c.id, { status: it.status, gitCommit: it.gitCommit ?? null, createdAt: new Date() } as CheckResult);
    }
    const rows = items.map((it) => ({
      projectId: project.id, caseId: byName.get(it.caseName)!.id,
      // CheckPush allows 'error', which CHECK_STATUSES in check-result.model.ts lacks; bulkCreate skips model validators.
      status: it.status as CheckStatus,
      details: { file: it.file, pushedBy: actor.id, report: it.details ?? null } satisfies StoredDetails,
      gitCommit: it.gitCommit ?? null,
    }));
    await CheckResult.bulkCreate(rows, { transaction });
    await audit({ userId: actor.id, projectId: project.id, action: 'checks.push', entity: 'project', entityId: project.id, details: { results: rows.length, newlyFailing: failures.length } }, transaction);
    return { results, failures };
  });
  const notice = outcome.failures.length ? await notifyChecksFailed(deps, project, outcome.failures, actor) : { recipients: [] };
  return { recorded: items.length, results: outcome.results, newlyFailing: outcome.failures.map((f) => f.caseName), notified: notice.recipients };
}

export interface PublicCheck {
  id: number;
  caseId: number;
  caseName: string;
  status: string;
  file: string | null;
  gitCommit: string | null;
  details: unknown;
  pushedBy: { id: number; name: string } | null;
  createdAt: Date;
}

export interface HistoryQuery {
  /** A case name; all cases of the project when absent. */
  case?: string;
  limit: number;
}

/** Newest first. */
export async function checkHistory(access: ProjectAccess, q: HistoryQuery): Promise<PublicCheck[]> {
  const projectId = access.project.id;
  let caseFilter = {};
  if (q.case !== undefined) {
    const c = await ReferenceCase.findOne({ where: { projectId, name: q.case } });
    if (!c) throw notFound('case-not-found', `No reference case named ${JSON.stringify(q.case)} in this project.`);
    caseFilter = { caseId: c.id };
  }
  const rows = await CheckResult.findAll({
    where: { projectId, ...caseFilter }, include: [{ model: ReferenceCase, as: 'case', attributes: ['id', 'name'] }],
    order: [['createdAt', 'DESC'], ['id', 'DESC']], limit: q.limit,
  });
  const stored = (r: CheckResult) => (r.details ?? {}) as Partial<StoredDetails>;
  const userIds = [...new Set(rows.map((r) => stored(r).pushedBy).filter((id): id is number => typeof id === 'number'))];
  const users = new Map((userIds.length ? await User.findAll({ where: { id: userIds } }) : []).map((u) => [u.id, u]));
  return rows.map((r) => {
    const d = stored(r);
    const u = typeof d.pushedBy === 'number' ? users.get(d.pushedBy) : undefined;
    return {
      id: r.id, caseId: r.caseId, caseName: (r as CheckResult & { case?: ReferenceCase }).case?.name ?? '', status: r.status,
      file: d.file ?? null, gitCommit: r.gitCommit, details: d.report ?? null, pushedBy: u ? { id: u.id, name: u.name } : null, createdAt: r.createdAt,
    };
  });
}
