import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** Names of the generic numeric parameter columns; Run.paramColumns maps study parameters onto them. */
export const PARAM_COLUMNS = ['p1', 'p2', 'p3', 'p4', 'p5', 'p6'] as const;
export type ParamColumn = (typeof PARAM_COLUMNS)[number];

/**
 * One variant of a run, as the CLI records it (shared/sweep/record-format.ts). Forces in kN,
 * displacements in m, weight in kN. `runPk` is runs.id; `variantId` the 16-hex stable id.
 * Peaks are null for unstable and failed variants. p1..p6 copy the numeric parameters that
 * charts bin on (see Run.paramColumns); p1..p4 are indexed with runPk, p5 and p6 are not
 * (migration 006: few families have a fifth numeric parameter, and every index costs each
 * pushed row an insert).
 */
export class Variant extends Model<InferAttributes<Variant>, InferCreationAttributes<Variant>> {
  declare id: CreationOptional<number>;
  declare runPk: number;
  declare index: number;
  declare variantId: string;
  declare params: Record<string, number | string>;
  declare status: 'unstable' | 'determinate' | 'indeterminate' | 'error';
  declare joints: number;
  declare members: number;
  declare reactions: number;
  declare k: number;
  declare s: number;
  declare critical: boolean;
  declare peakTension: number | null;
  declare peakTensionMember: string | null;
  declare peakCompression: number | null;
  declare peakCompressionMember: string | null;
  declare maxDisplacement: number | null;
  declare spanOverDeflection: number | null;
  declare weight: number | null;
  declare maxUtilisation: number | null;
  declare reason: string | null;
  declare p1: number | null;
  declare p2: number | null;
  declare p3: number | null;
  declare p4: number | null;
  declare p5: number | null;
  declare p6: number | null;

  static initModel(sequelize: Sequelize): void {
    // Fresh objects per attribute: Sequelize writes into attribute definitions.
    const double = () => ({ type: DataTypes.DOUBLE, allowNull: true });
    const int = () => ({ type: DataTypes.INTEGER, allowNull: false });
    const name = () => ({ type: DataTypes.STRING(64), allowNull: true });
    Variant.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        runPk: int(),
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
      },
      { sequelize, tableName: 'variants', timestamps: false },
    );
  }
}
