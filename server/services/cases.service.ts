/** Reference cases kept on the server, one name per project, each with its latest check result. */
import { col, fn, type Transaction } from 'sequelize';
import { CheckResult } from '../db/models/check-result.model';
import { ReferenceCase } from '../db/models/reference-case.model';
import { User } from '../db/models/user.model';
import type { ProjectAccess } from '../http/context';
import { conflict, notFound } from '../http/http-error';
import { audit } from './audit.service';
import { checkCaseBody } from './cases-check';

export interface LatestCheck {
  status: string;
  gitCommit: string | null;
  createdAt: Date;
}

export interface PublicCase {
  id: number;
  name: string;
  description: string | null;
  source: unknown;
  frozenBy: { id: number; name: string } | null;
  createdAt: Date;
  latest: LatestCheck | null;
}

type WithFreezer = ReferenceCase & { freezer?: User | null };

function publicCase(c: WithFreezer, latest: LatestCheck | null): PublicCase {
  const body = c.body as { description?: string; source?: unknown };
  return {
    id: c.id, name: c.name, description: body.description ?? null, source: body.source ?? null,
    frozenBy: c.freezer ? { id: c.freezer.id, name: c.freezer.name } : null, createdAt: c.createdAt, latest,
  };
}

/** The newest check result of each case, by case id. */
export async function latestResults(caseIds: readonly number[], transaction?: Transaction): Promise<Map<number, CheckResult>> {
  if (!caseIds.length) return new Map();
  const newest = (await CheckResult.findAll({
    attributes: [[fn('MAX', col('id')), 'id']], where: { caseId: [...caseIds] }, group: ['caseId'], raw: true, transaction,
  })) as unknown as { id: number }[];
  const rows = newest.length ? await CheckResult.findAll({ where: { id: newest.map((r) => r.id) }, transaction }) : [];
  return new Map(rows.map((r) => [r.caseId, r]));
}

const latestOf = (r: CheckResult | undefined): LatestCheck | null => (r ? { status: r.status, gitCommit: r.gitCommit, createdAt: r.createdAt } : null);

export async function createCase(actor: User, access: ProjectAccess, body: unknown): Promise<PublicCase & { body: unknown }> {
  const checked = checkCaseBody(body);
  const projectId = access.project.id;
  if (await ReferenceCase.findOne({ where: { projectId, name: checked.name } })) {
    throw conflict('case-exists', `The project has a reference case named "${checked.name}" already.`);
  }
  const row = await ReferenceCase.create({ projectId, name: checked.name, body, frozenBy: actor.id });
  await audit({ userId: actor.id, projectId, action: 'case.create', entity: 'reference-case', entityId: row.id, details: { name: row.name } });
  return { ...publicCase(Object.assign(row, { freezer: actor }), null), body: row.body };
}

export async function listCases(access: ProjectAccess): Promise<PublicCase[]> {
  const rows = (await ReferenceCase.findAll({
    where: { projectId: access.project.id }, include: [{ model: User, as: 'freezer' }], order: [['name', 'ASC']],
  })) as WithFreezer[];
  const latest = await latestResults(rows.map((r) => r.id));
  return rows.map((r) => publicCase(r, latestOf(latest.get(r.id))));
}

export async function getCase(access: ProjectAccess, idText: string): Promise<PublicCase & { body: unknown }> {
  const id = /^\d{1,10}$/.test(idText) ? Number(idText) : NaN;
  const row = Number.isNaN(id)
    ? null
    : ((await ReferenceCase.findOne({ where: { id, projectId: access.project.id }, include: [{ model: User, as: 'freezer' }] })) as WithFreezer | null);
  if (!row) throw notFound('case-not-found', 'No such reference case in this project.');
  const latest = await latestResults([row.id]);
  return { ...publicCase(row, latestOf(latest.get(row.id))), body: row.body };
}
