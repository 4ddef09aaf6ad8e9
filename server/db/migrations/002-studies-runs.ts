/** Studies, runs and variants, with the indexes the variant tables and charts sort and filter on. */
import { DataTypes, type QueryInterface } from 'sequelize';
import type { MigrationFn } from 'umzug';

// Factories, not shared objects: Sequelize may write into column definitions.
const id = () => ({ type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true, allowNull: false });
const ref = (table: string, allowNull: boolean) => ({
  type: DataTypes.INTEGER,
  allowNull,
  references: { model: table, key: 'id' },
  onUpdate: 'CASCADE',
  onDelete: allowNull ? 'SET NULL' : 'CASCADE',
});
const double = () => ({ type: DataTypes.DOUBLE, allowNull: true });
const int = () => ({ type: DataTypes.INTEGER, allowNull: false });
const name = () => ({ type: DataTypes.STRING(64), allowNull: true });

/** Columns of `variants` indexed together with runPk (one index each). */
const VARIANT_SORTS = ['status', 'peakCompression', 'peakTension', 'maxDisplacement', 'weight', 'p1', 'p2', 'p3', 'p4', 'p5', 'p6'];

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable('studies', {
    id: id(),
    projectId: ref('projects', false),
    name: { type: DataTypes.STRING(200), allowNull: false },
    family: { type: DataTypes.STRING(64), allowNull: false },
    hash: { type: DataTypes.CHAR(64), allowNull: false },
    body: { type: DataTypes.JSON, allowNull: false },
    createdBy: ref('users', true),
    createdAt: { type: DataTypes.DATE(3), allowNull: false },
    updatedAt: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('studies', ['projectId', 'hash'], { name: 'studies_project_hash' });
  await qi.addIndex('studies', ['projectId', 'name'], { name: 'studies_project_name' });

  await qi.createTable('runs', {
    id: id(),
    runId: { type: DataTypes.CHAR(36), allowNull: false, unique: true },
    projectId: ref('projects', false),
    studyId: ref('studies', false),
    pushedBy: ref('users', true),
    pushedAt: { type: DataTypes.DATE(3), allowNull: false },
    updatedAt: { type: DataTypes.DATE(3), allowNull: false },
    cliVersion: { type: DataTypes.STRING(32), allowNull: false },
    gitCommit: { type: DataTypes.STRING(64), allowNull: true },
    shards: { type: DataTypes.JSON, allowNull: false },
    status: { type: DataTypes.STRING(16), allowNull: false },
    summary: { type: DataTypes.JSON, allowNull: true },
    variantCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    paramColumns: { type: DataTypes.JSON, allowNull: false },
  });
  await qi.addIndex('runs', ['projectId', 'pushedAt'], { name: 'runs_project_pushed' });

  await qi.createTable('variants', {
    id: id(),
    runPk: ref('runs', false),
    index: int(),
    variantId: { type: DataTypes.CHAR(16), allowNull: false },
    params: { type: DataTypes.JSON, allowNull: false },
    status: { type: DataTypes.STRING(16), allowNull: false },
    joints: int(),
    members: int(),
    reactions: int(),
    k: int(),
    s: int(),
    critical: { type: DataTypes.BOOLEAN, allowNull: false },
    peakTension: double(),
    peakTensionMember: name(),
    peakCompression: double(),
    peakCompressionMember: name(),
    maxDisplacement: double(),
    spanOverDeflection: double(),
    weight: double(),
    maxUtilisation: double(),
    reason: { type: DataTypes.STRING(500), allowNull: true },
    p1: double(), p2: double(), p3: double(), p4: double(), p5: double(), p6: double(),
  });
  await qi.addIndex('variants', ['runPk', 'index'], { unique: true, name: 'variants_run_index' });
  await qi.addIndex('variants', ['runPk', 'variantId'], { name: 'variants_run_variant_id' });
  for (const column of VARIANT_SORTS) {
    await qi.addIndex('variants', ['runPk', column], { name: `variants_run_${column}` });
  }
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  for (const table of ['variants', 'runs', 'studies']) await qi.dropTable(table);
};
