/** Studies of a project: one row per distinct study body (by its hash), kept when a run is pushed. */
import { fn, col, UniqueConstraintError, type Transaction } from 'sequelize';
import { Run } from '../db/models/run.model';
import { Study } from '../db/models/study.model';
import type { User } from '../db/models/user.model';
import type { ProjectAccess } from '../http/context';
import { notFound } from '../http/http-error';

export interface PublicStudy {
  id: number;
  name: string;
  family: string;
  hash: string;
  createdAt: Date;
  runCount: number;
}

const publicStudy = (s: Study, runCount: number): PublicStudy => ({
  id: s.id, name: s.name, family: s.family, hash: s.hash.trim(), createdAt: s.createdAt, runCount,
});

/** The project's studies, newest first, with how many runs each has. */
export async function listStudies(access: ProjectAccess): Promise<PublicStudy[]> {
  const projectId = access.project.id;
  const studies = await Study.findAll({ where: { projectId }, order: [['createdAt', 'DESC'], ['id', 'DESC']] });
  const counts = (await Run.findAll({
    attributes: ['studyId', [fn('COUNT', col('id')), 'n']], where: { projectId }, group: ['studyId'], raw: true,
  })) as unknown as { studyId: number; n: number | string }[];
  const byStudy = new Map(counts.map((c) => [c.studyId, Number(c.n)]));
  return studies.map((s) => publicStudy(s, byStudy.get(s.id) ?? 0));
}

/** One study with its body; 404 outside the project. */
export async function getStudy(access: ProjectAccess, idText: string): Promise<PublicStudy & { body: unknown }> {
  const id = /^\d{1,10}$/.test(idText) ? Number(idText) : NaN;
  const s = Number.isNaN(id) ? null : await Study.findOne({ where: { id, projectId: access.project.id } });
  if (!s) throw notFound('study-not-found', 'No such study in this project.');
  const runCount = await Run.count({ where: { studyId: s.id } });
  return { ...publicStudy(s, runCount), body: s.body };
}

export interface StudyInput {
  name: string;
  family: string;
  hash: string;
  body: unknown;
}

/** The project's study with this hash, created when new (a concurrent push of the same study is waited for). */
export async function findOrCreateStudy(projectId: number, input: StudyInput, user: User, transaction: Transaction): Promise<Study> {
  const find = () => Study.findOne({ where: { projectId, hash: input.hash }, transaction, lock: transaction.LOCK.UPDATE });
  const found = await find();
  if (found) return found;
  try {
    return await Study.create({ projectId, name: input.name, family: input.family, hash: input.hash, body: input.body, createdBy: user.id }, { transaction });
  } catch (e) {
    if (!(e instanceof UniqueConstraintError)) throw e;
    const again = await find();
    if (!again) throw e;
    return again;
  }
}
