import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A message received by the local capture SMTP server (the start command's stand-in for a relay). */
export class MailMessageModel extends Model<InferAttributes<MailMessageModel>, InferCreationAttributes<MailMessageModel>> {
  declare id: CreationOptional<string>;
  declare toAddresses: string[];
  declare fromAddress: CreationOptional<string>;
  declare subject: string;
  declare text: string;
  declare receivedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    MailMessageModel.init(
      {
        id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
        toAddresses: { type: DataTypes.JSONB, allowNull: false },
        fromAddress: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        subject: { type: DataTypes.TEXT, allowNull: false },
        text: { type: DataTypes.TEXT, allowNull: false },
        receivedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, tableName: 'mail_messages', modelName: 'MailMessage', timestamps: false },
    );
  }
}
