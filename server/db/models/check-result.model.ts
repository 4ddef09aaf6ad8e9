import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export const CHECK_STATUSES = ['pass', 'drift', 'invalid'] as const;
export type CheckStatus = (typeof CHECK_STATUSES)[number];

/** The outcome of checking one reference case at one commit. */
export class CheckResult extends Model<InferAttributes<CheckResult>, InferCreationAttributes<CheckResult>> {
  declare id: CreationOptional<number>;
  declare projectId: number;
  declare caseId: number;
  declare status: CheckStatus;
  declare details: unknown;
  declare gitCommit: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    CheckResult.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        projectId: { type: DataTypes.INTEGER, allowNull: false },
        caseId: { type: DataTypes.INTEGER, allowNull: false },
        status: { type: DataTypes.STRING(16), allowNull: false, validate: { isIn: [CHECK_STATUSES as unknown as string[]] } },
        details: { type: DataTypes.JSON, allowNull: true },
        gitCommit: { type: DataTypes.STRING(64), allowNull: true },
        createdAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'check_results', updatedAt: false },
    );
  }
}
