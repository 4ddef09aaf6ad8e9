import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/**
 * Who did what, when: `action` like 'auth.sign-in', 'member.role', 'token.revoke'; `entity` and
 * `entityId` name the thing acted on; `details` never holds secrets.
 */
export class AuditLog extends Model<InferAttributes<AuditLog>, InferCreationAttributes<AuditLog>> {
  declare id: CreationOptional<number>;
  declare userId: number | null;
  declare projectId: number | null;
  declare action: string;
  declare entity: string;
  declare entityId: string | null;
  declare details: unknown;
  declare at: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    AuditLog.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER, allowNull: true },
        projectId: { type: DataTypes.INTEGER, allowNull: true },
        action: { type: DataTypes.STRING(64), allowNull: false },
        entity: { type: DataTypes.STRING(32), allowNull: false },
        entityId: { type: DataTypes.STRING(64), allowNull: true },
        details: { type: DataTypes.JSON, allowNull: true },
        at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, tableName: 'audit_logs', timestamps: false },
    );
  }
}
