import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/**
 * One message the development SMTP sink received (table captured_mails, migration 004). Kept
 * beside the sink rather than in db/models because only the sink and GET /api/admin/mail use it;
 * `bindCapturedMail` binds it to the app's Sequelize (it is not in db/init-models' MODELS).
 */
export class CapturedMail extends Model<InferAttributes<CapturedMail>, InferCreationAttributes<CapturedMail>> {
  declare id: CreationOptional<number>;
  declare messageId: string | null;
  /** Envelope MAIL FROM. */
  declare sender: string | null;
  /** Envelope RCPT TO addresses. */
  declare recipients: string[];
  /** The To header as written. */
  declare toHeader: string | null;
  declare subject: string;
  /** The text/plain body, decoded. */
  declare text: string;
  declare html: string | null;
  /** The message exactly as received (headers and body). */
  declare raw: Buffer;
  declare receivedAt: Date;

  static initModel(sequelize: Sequelize): void {
    CapturedMail.init(
      {
        id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true },
        messageId: { type: DataTypes.STRING(255), allowNull: true },
        sender: { type: DataTypes.STRING(320), allowNull: true },
        recipients: { type: DataTypes.JSON, allowNull: false },
        toHeader: { type: DataTypes.STRING(1000), allowNull: true },
        subject: { type: DataTypes.STRING(1000), allowNull: false },
        text: { type: DataTypes.TEXT('medium'), allowNull: false },
        html: { type: DataTypes.TEXT('medium'), allowNull: true },
        raw: { type: DataTypes.BLOB('medium'), allowNull: false },
        receivedAt: { type: DataTypes.DATE(3), allowNull: false },
      },
      { sequelize, tableName: 'captured_mails', timestamps: false },
    );
  }
}

/** Bind CapturedMail to `sequelize` (again only when it is bound elsewhere). */
export function bindCapturedMail(sequelize: Sequelize): void {
  if (CapturedMail.sequelize !== sequelize) CapturedMail.initModel(sequelize);
}
