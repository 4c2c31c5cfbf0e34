import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class Shop extends Model<InferAttributes<Shop>, InferCreationAttributes<Shop>> {
  declare id: CreationOptional<string>;
  declare name: string;
  /** When the owner closed the shop; its people cannot sign in (the owner may reopen it). */
  declare closedAt: CreationOptional<Date | null>;
  /** A closed shop's data is deleted after this (the grace period). */
  declare purgeAfter: CreationOptional<Date | null>;
  /** The units new people of the shop start with. */
  declare defaultUnits: CreationOptional<'imperial' | 'metric'>;
  declare defaultLengthUnit: CreationOptional<'in' | 'cm' | null>;
  declare defaultAltitudeUnit: CreationOptional<'ft' | 'm' | null>;
  declare defaultTemperatureUnit: CreationOptional<'f' | 'c' | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Shop.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        name: { type: DataTypes.STRING(160), allowNull: false },
        closedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        purgeAfter: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        defaultUnits: { type: DataTypes.ENUM('imperial', 'metric'), allowNull: false, defaultValue: 'imperial' },
        defaultLengthUnit: { type: DataTypes.ENUM('in', 'cm'), allowNull: true, defaultValue: null },
        defaultAltitudeUnit: { type: DataTypes.ENUM('ft', 'm'), allowNull: true, defaultValue: null },
        defaultTemperatureUnit: { type: DataTypes.ENUM('f', 'c'), allowNull: true, defaultValue: null },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'shops' },
    );
  }
}
