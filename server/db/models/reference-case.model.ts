import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A frozen model and its expected results, checked again on later versions; (projectId, name) is unique. */
export class ReferenceCase extends Model<InferAttributes<ReferenceCase>, InferCreationAttributes<ReferenceCase>> {
  declare id: CreationOptional<number>;
  declare projectId: number;
  declare name: string;
  declare body: unknown;
  declare frozenBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    ReferenceCase.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        projectId: { type: DataTypes.INTEGER, allowNull: false },
        name: { type: DataTypes.STRING(200), allowNull: false },
        body: { type: DataTypes.JSON, allowNull: false },
        frozenBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: { type: DataTypes.DATE(3), allowNull: false },
        updatedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'reference_cases' },
    );
  }
}
