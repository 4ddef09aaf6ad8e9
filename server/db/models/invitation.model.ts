import {
  DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize,
} from 'sequelize';
import { ROLES, type Role } from '../../auth/rights';
import type { Project } from './project.model';

/** An invitation to join a project with a role: the mailed token's sha256, one use, until `expiresAt`. */
export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<number>;
  declare projectId: number;
  declare email: string;
  declare role: Role;
  declare tokenHash: string;
  declare invitedBy: number | null;
  declare expiresAt: Date;
  declare usedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare project?: NonAttribute<Project>;

  static initModel(sequelize: Sequelize): void {
    Invitation.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        projectId: { type: DataTypes.INTEGER, allowNull: false },
        email: { type: DataTypes.STRING(254), allowNull: false },
        role: { type: DataTypes.STRING(16), allowNull: false, validate: { isIn: [ROLES as unknown as string[]] } },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
        invitedBy: { type: DataTypes.INTEGER, allowNull: true },
        expiresAt: { type: DataTypes.DATE(3), allowNull: false },
        usedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: { type: DataTypes.DATE(3), allowNull: false },
        updatedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'invitations' },
    );
  }
}
