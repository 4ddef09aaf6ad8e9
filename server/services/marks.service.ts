/**
 * One mark per user per variant: candidate (right variants:mark) or rejected (variants:reject).
 * Setting replaces the caller's own mark; removing needs the right of the mark's kind.
 */
import type { ProjectRight } from '../auth/rights';
import { Mark, type MarkKind } from '../db/models/mark.model';
import type { User } from '../db/models/user.model';
import type { ProjectAccess } from '../http/context';
import { forbidden } from '../http/http-error';
import { findVariantRow } from './variants.service';
import type { PublicMark } from './variants-sql';

const RIGHT: Record<MarkKind, ProjectRight> = { candidate: 'variants:mark', rejected: 'variants:reject' };

function need(access: ProjectAccess, kind: MarkKind): void {
  if (!access.rights.has(RIGHT[kind])) throw forbidden(`You need the right ${RIGHT[kind]} in this project to mark a variant ${kind}.`);
}

export async function setMyMark(access: ProjectAccess, user: User, runId: string, index: string, kind: MarkKind): Promise<PublicMark> {
  need(access, kind);
  const v = await findVariantRow(access, runId, index);
  const mark = await Mark.findOne({ where: { variantPk: v.id, userId: user.id } });
  const saved = mark ? await mark.update({ kind }) : await Mark.create({ variantPk: v.id, userId: user.id, kind });
  return { kind: saved.kind, user: { id: user.id, name: user.name }, updatedAt: saved.updatedAt };
}

/** Remove the caller's mark (nothing to do when there is none, given a marking right). */
export async function clearMyMark(access: ProjectAccess, user: User, runId: string, index: string): Promise<void> {
  if (!access.rights.has('variants:mark') && !access.rights.has('variants:reject')) need(access, 'candidate');
  const v = await findVariantRow(access, runId, index);
  const mark = await Mark.findOne({ where: { variantPk: v.id, userId: user.id } });
  if (!mark) return;
  need(access, mark.kind);
  await mark.destroy();
}
