import {
  DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize,
} from 'sequelize';
import type { ProjectRight } from '../../auth/rights';
import type { User } from './user.model';

/**
 * A personal API token for one project (`pp_<prefix>_<secret>`): looked up by `prefix`, checked
 * against the sha256 of the whole token; the secret itself is never stored.
 */
export class ApiToken extends Model<InferAttributes<ApiToken>, InferCreationAttributes<ApiToken>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare projectId: number;
  declare name: string;
  /** sha256 hex of the whole token text. */
  declare tokenHash: string;
  declare prefix: string;
  declare scopes: ProjectRight[];
  declare lastUsedAt: Date | null;
  declare revokedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare user?: NonAttribute<User>;

  static initModel(sequelize: Sequelize): void {
    ApiToken.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        projectId: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(100), allowNull: false },
        tokenHash: { type: DataTypes.CHAR(64), allowNull: false },
        prefix: { type: DataTypes.STRING(16), allowNull: false, unique: true },
        scopes: { type: DataTypes.JSON, allowNull: false },
        lastUsedAt: { type: DataTypes.DATE(3), allowNull: true },
        revokedAt: { type: DataTypes.DATE(3), allowNull: true },
        createdAt: { type: DataTypes.DATE(3), allowNull: false },
        updatedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'api_tokens' },
    );
  }
}
