import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export const UPLOAD_KINDS = ['study', 'model', 'dxf'] as const;
export type UploadKind = (typeof UPLOAD_KINDS)[number];

/** A file kept in deps.storage under `storageKey`; `size` in bytes. */
export class Upload extends Model<InferAttributes<Upload>, InferCreationAttributes<Upload>> {
  declare id: CreationOptional<number>;
  declare projectId: number;
  declare kind: UploadKind;
  declare originalName: string;
  declare storageKey: string;
  declare size: number;
  declare contentType: string;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Upload.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        projectId: { type: DataTypes.INTEGER, allowNull: false },
        kind: { type: DataTypes.STRING(16), allowNull: false, validate: { isIn: [UPLOAD_KINDS as unknown as string[]] } },
        originalName: { type: DataTypes.STRING(255), allowNull: false },
        storageKey: { type: DataTypes.STRING(255), allowNull: false, unique: true },
        size: { type: DataTypes.INTEGER, allowNull: false },
        contentType: { type: DataTypes.STRING(128), allowNull: false },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: { type: DataTypes.DATE(3), allowNull: false },
        updatedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'uploads' },
    );
  }
}
