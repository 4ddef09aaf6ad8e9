import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A study file as pushed: `body` is the study JSON; `hash` identifies identical bodies. */
export class Study extends Model<InferAttributes<Study>, InferCreationAttributes<Study>> {
  declare id: CreationOptional<number>;
  declare projectId: number;
  declare name: string;
  /** Truss family id, e.g. `pratt`. */
  declare family: string;
  /** sha256 hex of the canonical body. */
  declare hash: string;
  declare body: unknown;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Study.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        projectId: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(200), allowNull: false },
        family: { type: DataTypes.STRING(64), allowNull: false },
        hash: { type: DataTypes.CHAR(64), allowNull: false },
        body: { type: DataTypes.JSON, allowNull: false },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: { type: DataTypes.DATE(3), allowNull: false },
        updatedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'studies' },
    );
  }
}
