/**
 * Bind every model class to a Sequelize instance and set up the associations. The classes are
 * module-wide, so one process works with one database at a time; calling this again with the
 * same instance does nothing, with another instance rebinds every model.
 */
import type { Sequelize } from 'sequelize';
import { associate } from './associations';
import { ApiToken } from './models/api-token.model';
import { AuditLog } from './models/audit-log.model';
import { CheckResult } from './models/check-result.model';
import { Comment } from './models/comment.model';
import { Invitation } from './models/invitation.model';
import { Mark } from './models/mark.model';
import { Membership } from './models/membership.model';
import { PasswordReset } from './models/password-reset.model';
import { Project } from './models/project.model';
import { ReferenceCase } from './models/reference-case.model';
import { Run } from './models/run.model';
import { Study } from './models/study.model';
import { Upload } from './models/upload.model';
import { User } from './models/user.model';
import { Variant } from './models/variant.model';

/** Every model, for tests that compare models with the migrated tables. */
export const MODELS = [
  User, Project, Membership, Study, Run, Variant, Mark, Comment, ReferenceCase, CheckResult,
  ApiToken, Upload, PasswordReset, Invitation, AuditLog,
] as const;

const bound = new WeakSet<Sequelize>();

export function initModels(sequelize: Sequelize): void {
  if (bound.has(sequelize) && User.sequelize === sequelize) return;
  for (const model of MODELS) model.initModel(sequelize);
  associate();
  bound.add(sequelize);
}
