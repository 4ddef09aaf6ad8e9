/** Audit trail: one row per security-relevant action (sign-in, roles, members, tokens). */
import type { Transaction } from 'sequelize';
import { AuditLog } from '../db/models/audit-log.model';
import { redact } from './redact';

export interface AuditEntry {
  /** Who acted; null for an unknown caller (a failed sign-in with an unknown email). */
  userId: number | null;
  projectId?: number | null;
  /** `<entity>.<verb>`, e.g. 'member.role', 'token.revoke'. */
  action: string;
  entity: string;
  entityId?: string | number | null;
  /** Extra facts (old and new role...); secrets are redacted anyway. */
  details?: Record<string, unknown>;
}

export async function audit(entry: AuditEntry, transaction?: Transaction): Promise<void> {
  await AuditLog.create(
    {
      userId: entry.userId,
      projectId: entry.projectId ?? null,
      action: entry.action,
      entity: entry.entity,
      entityId: entry.entityId === undefined || entry.entityId === null ? null : String(entry.entityId),
      details: entry.details ? redact(entry.details) : null,
    },
    { transaction },
  );
}
