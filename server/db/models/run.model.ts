import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** Which generic numeric column of Variant holds which study parameter: `{ span: 'p1', depth: 'p2' }`. */
export type ParamColumns = Partial<Record<string, 'p1' | 'p2' | 'p3' | 'p4' | 'p5' | 'p6'>>;

/**
 * One sweep pushed from the CLI. `runId` is the CLI's own uuid (manifest `runId`); rows that
 * refer to a run (Variant.runPk) use the integer `id`.
 */
export class Run extends Model<InferAttributes<Run>, InferCreationAttributes<Run>> {
  declare id: CreationOptional<number>;
  declare runId: string;
  declare projectId: number;
  declare studyId: number;
  declare pushedBy: number | null;
  declare pushedAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare cliVersion: string;
  declare gitCommit: string | null;
  /** Shards received, e.g. `[{ index: 1, count: 4, range: { start, end } }]`. */
  declare shards: unknown;
  /** e.g. 'receiving', 'complete', 'interrupted' (the runs feature decides). */
  declare status: string;
  declare summary: unknown;
  declare variantCount: CreationOptional<number>;
  declare paramColumns: CreationOptional<ParamColumns>;

  static initModel(sequelize: Sequelize): void {
    Run.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        runId: { type: DataTypes.CHAR(36), allowNull: false, unique: true },
        projectId: { type: DataTypes.INTEGER, allowNull: false },
        studyId: { type: DataTypes.INTEGER, allowNull: false },
        pushedBy: { type: DataTypes.INTEGER, allowNull: true },
        pushedAt: { type: DataTypes.DATE(3), allowNull: false },
        updatedAt: { type: DataTypes.DATE(3), allowNull: false },
        cliVersion: { type: DataTypes.STRING(32), allowNull: false },
        gitCommit: { type: DataTypes.STRING(64), allowNull: true },
        shards: { type: DataTypes.JSON, allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false },
        summary: { type: DataTypes.JSON, allowNull: true },
        variantCount: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        paramColumns: { type: DataTypes.JSON, allowNull: false, defaultValue: {} },
      },
      { sequelize, tableName: 'runs', createdAt: 'pushedAt' },
    );
  }
}
