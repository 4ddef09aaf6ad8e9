/**
 * Every association between the models, in one place. Foreign-key columns are declared in the
 * models and created by migrations; these calls only teach Sequelize how to join (`include`).
 */
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

export function associate(): void {
  User.hasMany(Membership, { foreignKey: 'userId', as: 'memberships' });
  Membership.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Project.hasMany(Membership, { foreignKey: 'projectId', as: 'memberships' });
  Membership.belongsTo(Project, { foreignKey: 'projectId', as: 'project' });

  Project.hasMany(Study, { foreignKey: 'projectId', as: 'studies' });
  Study.belongsTo(Project, { foreignKey: 'projectId', as: 'project' });
  Study.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });

  Project.hasMany(Run, { foreignKey: 'projectId', as: 'runs' });
  Run.belongsTo(Project, { foreignKey: 'projectId', as: 'project' });
  Study.hasMany(Run, { foreignKey: 'studyId', as: 'runs' });
  Run.belongsTo(Study, { foreignKey: 'studyId', as: 'study' });
  Run.belongsTo(User, { foreignKey: 'pushedBy', as: 'pusher' });
  Run.hasMany(Variant, { foreignKey: 'runPk', as: 'variants' });
  Variant.belongsTo(Run, { foreignKey: 'runPk', as: 'run' });

  Variant.hasMany(Mark, { foreignKey: 'variantPk', as: 'marks' });
  Mark.belongsTo(Variant, { foreignKey: 'variantPk', as: 'variant' });
  Mark.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Variant.hasMany(Comment, { foreignKey: 'variantPk', as: 'comments' });
  Comment.belongsTo(Variant, { foreignKey: 'variantPk', as: 'variant' });
  Comment.belongsTo(User, { foreignKey: 'userId', as: 'author' });

  Project.hasMany(ReferenceCase, { foreignKey: 'projectId', as: 'cases' });
  ReferenceCase.belongsTo(Project, { foreignKey: 'projectId', as: 'project' });
  ReferenceCase.belongsTo(User, { foreignKey: 'frozenBy', as: 'freezer' });
  ReferenceCase.hasMany(CheckResult, { foreignKey: 'caseId', as: 'results' });
  CheckResult.belongsTo(ReferenceCase, { foreignKey: 'caseId', as: 'case' });
  CheckResult.belongsTo(Project, { foreignKey: 'projectId', as: 'project' });

  User.hasMany(ApiToken, { foreignKey: 'userId', as: 'tokens' });
  ApiToken.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  ApiToken.belongsTo(Project, { foreignKey: 'projectId', as: 'project' });

  Project.hasMany(Upload, { foreignKey: 'projectId', as: 'uploads' });
  Upload.belongsTo(Project, { foreignKey: 'projectId', as: 'project' });
  Upload.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });

  PasswordReset.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Invitation.belongsTo(Project, { foreignKey: 'projectId', as: 'project' });
  Invitation.belongsTo(User, { foreignKey: 'invitedBy', as: 'inviter' });
  AuditLog.belongsTo(User, { foreignKey: 'userId', as: 'user' });
}
