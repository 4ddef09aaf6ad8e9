/** Accounts and access: users, projects, memberships, API tokens, resets, invitations, audit log. */
import { DataTypes, type QueryInterface } from 'sequelize';
import type { MigrationFn } from 'umzug';

// Factories, not shared objects: Sequelize may write into column definitions.
const id = () => ({ type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true, allowNull: false });
const stamps = () => ({ createdAt: { type: DataTypes.DATE(3), allowNull: false }, updatedAt: { type: DataTypes.DATE(3), allowNull: false } });
const ref = (table: string, allowNull: boolean) => ({
  type: DataTypes.INTEGER,
  allowNull,
  references: { model: table, key: 'id' },
  onUpdate: 'CASCADE',
  onDelete: allowNull ? 'SET NULL' : 'CASCADE',
});

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable('users', {
    id: id(),
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    passwordHash: { type: DataTypes.STRING(100), allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false },
    disabled: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    ...stamps(),
  });
  await qi.createTable('projects', {
    id: id(),
    slug: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    description: { type: DataTypes.TEXT, allowNull: false },
    ...stamps(),
  });
  await qi.createTable('memberships', {
    id: id(),
    userId: ref('users', false),
    projectId: ref('projects', false),
    role: { type: DataTypes.STRING(16), allowNull: false },
    ...stamps(),
  });
  await qi.addIndex('memberships', ['userId', 'projectId'], { unique: true, name: 'memberships_user_project' });
  await qi.addIndex('memberships', ['projectId', 'role'], { name: 'memberships_project_role' });

  await qi.createTable('api_tokens', {
    id: id(),
    userId: ref('users', false),
    projectId: ref('projects', false),
    name: { type: DataTypes.STRING(100), allowNull: false },
    tokenHash: { type: DataTypes.CHAR(64), allowNull: false },
    prefix: { type: DataTypes.STRING(16), allowNull: false, unique: true },
    scopes: { type: DataTypes.JSON, allowNull: false },
    lastUsedAt: { type: DataTypes.DATE(3), allowNull: true },
    revokedAt: { type: DataTypes.DATE(3), allowNull: true },
    ...stamps(),
  });
  await qi.addIndex('api_tokens', ['projectId', 'userId'], { name: 'api_tokens_project_user' });

  await qi.createTable('password_resets', {
    id: id(),
    userId: ref('users', false),
    email: { type: DataTypes.STRING(254), allowNull: false },
    tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expiresAt: { type: DataTypes.DATE(3), allowNull: false },
    usedAt: { type: DataTypes.DATE(3), allowNull: true },
    createdAt: { type: DataTypes.DATE(3), allowNull: false },
  });

  await qi.createTable('invitations', {
    id: id(),
    projectId: ref('projects', false),
    email: { type: DataTypes.STRING(254), allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false },
    tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    invitedBy: ref('users', true),
    expiresAt: { type: DataTypes.DATE(3), allowNull: false },
    usedAt: { type: DataTypes.DATE(3), allowNull: true },
    ...stamps(),
  });
  await qi.addIndex('invitations', ['projectId', 'email'], { name: 'invitations_project_email' });

  await qi.createTable('audit_logs', {
    id: id(),
    userId: ref('users', true),
    projectId: ref('projects', true),
    action: { type: DataTypes.STRING(64), allowNull: false },
    entity: { type: DataTypes.STRING(32), allowNull: false },
    entityId: { type: DataTypes.STRING(64), allowNull: true },
    details: { type: DataTypes.JSON, allowNull: true },
    at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('audit_logs', ['at'], { name: 'audit_logs_at' });
  await qi.addIndex('audit_logs', ['entity', 'entityId'], { name: 'audit_logs_entity' });
  await qi.addIndex('audit_logs', ['projectId', 'at'], { name: 'audit_logs_project_at' });
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  for (const table of ['audit_logs', 'invitations', 'password_resets', 'api_tokens', 'memberships', 'projects', 'users']) {
    await qi.dropTable(table);
  }
};
