import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export const MARK_KINDS = ['candidate', 'rejected'] as const;
export type MarkKind = (typeof MARK_KINDS)[number];

/** One user's verdict on one variant; (variantPk, userId) is unique. `variantPk` is variants.id. */
export class Mark extends Model<InferAttributes<Mark>, InferCreationAttributes<Mark>> {
  declare id: CreationOptional<number>;
  declare variantPk: number;
  declare userId: number;
  declare kind: MarkKind;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Mark.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        variantPk: { type: DataTypes.INTEGER, allowNull: false },
        userId: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.STRING(16), allowNull: false, validate: { isIn: [MARK_KINDS as unknown as string[]] } },
        createdAt: { type: DataTypes.DATE(3), allowNull: false },
        updatedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'marks' },
    );
  }
}
