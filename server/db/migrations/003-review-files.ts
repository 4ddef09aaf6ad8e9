/** Review and checking: marks, comments, reference cases, check results; uploaded files. */
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
  await qi.createTable('marks', {
    id: id(),
    variantPk: ref('variants', false),
    userId: ref('users', false),
    kind: { type: DataTypes.STRING(16), allowNull: false },
    ...stamps(),
  });
  await qi.addIndex('marks', ['variantPk', 'userId'], { unique: true, name: 'marks_variant_user' });
  await qi.addIndex('marks', ['userId', 'kind'], { name: 'marks_user_kind' });

  await qi.createTable('comments', {
    id: id(),
    variantPk: ref('variants', false),
    userId: ref('users', true),
    body: { type: DataTypes.TEXT, allowNull: false },
    ...stamps(),
  });
  await qi.addIndex('comments', ['variantPk', 'createdAt'], { name: 'comments_variant_created' });

  await qi.createTable('reference_cases', {
    id: id(),
    projectId: ref('projects', false),
    name: { type: DataTypes.STRING(200), allowNull: false },
    body: { type: DataTypes.JSON, allowNull: false },
    frozenBy: ref('users', true),
    ...stamps(),
  });
  await qi.addIndex('reference_cases', ['projectId', 'name'], { unique: true, name: 'reference_cases_project_name' });

  await qi.createTable('check_results', {
    id: id(),
    projectId: ref('projects', false),
    caseId: ref('reference_cases', false),
    status: { type: DataTypes.STRING(16), allowNull: false },
    details: { type: DataTypes.JSON, allowNull: true },
    gitCommit: { type: DataTypes.STRING(64), allowNull: true },
    createdAt: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('check_results', ['caseId', 'createdAt'], { name: 'check_results_case_created' });
  await qi.addIndex('check_results', ['projectId', 'createdAt'], { name: 'check_results_project_created' });

  await qi.createTable('uploads', {
    id: id(),
    projectId: ref('projects', false),
    kind: { type: DataTypes.STRING(16), allowNull: false },
    originalName: { type: DataTypes.STRING(255), allowNull: false },
    storageKey: { type: DataTypes.STRING(255), allowNull: false, unique: true },
    size: { type: DataTypes.INTEGER, allowNull: false },
    contentType: { type: DataTypes.STRING(128), allowNull: false },
    createdBy: ref('users', true),
    ...stamps(),
  });
  await qi.addIndex('uploads', ['projectId', 'kind'], { name: 'uploads_project_kind' });
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  for (const table of ['uploads', 'check_results', 'reference_cases', 'comments', 'marks']) await qi.dropTable(table);
};
