import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A sent spec sheet: its content as sent (JSON), its state and who sent and accepted it. */
export class SpecSheetRecord extends Model<InferAttributes<SpecSheetRecord>, InferCreationAttributes<SpecSheetRecord>> {
  declare id: CreationOptional<string>;
  declare shopId: string;
  declare fittingId: string;
  declare playerId: string;
  declare state: 'sent' | 'accepted';
  declare content: string;
  declare sentAt: Date;
  declare sentBy: string | null;
  declare acceptedAt: Date | null;
  declare acceptedBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    SpecSheetRecord.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        shopId: { type: DataTypes.UUID, allowNull: false },
        fittingId: { type: DataTypes.UUID, allowNull: false, unique: true },
        playerId: { type: DataTypes.UUID, allowNull: false },
        state: { type: DataTypes.ENUM('sent', 'accepted'), allowNull: false },
        content: { type: DataTypes.TEXT('long'), allowNull: false },
        sentAt: { type: DataTypes.DATE, allowNull: false },
        sentBy: { type: DataTypes.UUID, allowNull: true },
        acceptedAt: { type: DataTypes.DATE, allowNull: true },
        acceptedBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'spec_sheets' },
    );
  }
}
