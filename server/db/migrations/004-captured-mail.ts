/** Mail caught by the development SMTP sink (server/services/smtp-sink.ts), read by admins at GET /api/admin/mail. */
import { DataTypes, type QueryInterface } from 'sequelize';
import type { MigrationFn } from 'umzug';

export const up: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.createTable('captured_mails', {
    id: { type: DataTypes.INTEGER, autoIncrement: true, primaryKey: true, allowNull: false },
    messageId: { type: DataTypes.STRING(255), allowNull: true },
    sender: { type: DataTypes.STRING(320), allowNull: true },
    recipients: { type: DataTypes.JSON, allowNull: false },
    toHeader: { type: DataTypes.STRING(1000), allowNull: true },
    subject: { type: DataTypes.STRING(1000), allowNull: false },
    text: { type: DataTypes.TEXT('medium'), allowNull: false },
    html: { type: DataTypes.TEXT('medium'), allowNull: true },
    raw: { type: DataTypes.BLOB('medium'), allowNull: false },
    receivedAt: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('captured_mails', ['receivedAt'], { name: 'captured_mails_received' });
};

export const down: MigrationFn<QueryInterface> = async ({ context: qi }) => {
  await qi.dropTable('captured_mails');
};
