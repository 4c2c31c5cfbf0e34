import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** A shop's workshop settings: wedge-wear counts and the static-fit table (JSON). */
export class WorkshopSettingsRecord extends Model<InferAttributes<WorkshopSettingsRecord>, InferCreationAttributes<WorkshopSettingsRecord>> {
  declare shopId: string;
  declare wedgeWearRounds: number;
  declare wedgeWearPracticeSessions: number;
  declare staticFitTable: string;
  declare updatedBy: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    WorkshopSettingsRecord.init(
      {
        shopId: { type: DataTypes.UUID, primaryKey: true },
        wedgeWearRounds: { type: DataTypes.INTEGER, allowNull: false },
        wedgeWearPracticeSessions: { type: DataTypes.INTEGER, allowNull: false },
        staticFitTable: { type: DataTypes.TEXT, allowNull: false },
        updatedBy: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'workshop_settings' },
    );
  }
}
