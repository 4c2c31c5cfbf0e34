import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Shop } from './shop';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<string>;
  declare shopId: ForeignKey<Shop['id']>;
  declare email: string;
  declare name: string;
  declare passwordHash: string;
  declare role: 'owner' | 'fitter' | 'player';
  declare active: CreationOptional<boolean>;
  declare units: CreationOptional<'imperial' | 'metric'>;
  /** Raised to end every session of this user at once. */
  declare tokenVersion: CreationOptional<number>;
  /** When the address was confirmed by its link; an owner who signed up cannot sign in before. */
  declare emailVerifiedAt: CreationOptional<Date | null>;
  /** Per-quantity units; null follows `units`. */
  declare lengthUnit: CreationOptional<'in' | 'cm' | null>;
  declare altitudeUnit: CreationOptional<'ft' | 'm' | null>;
  declare temperatureUnit: CreationOptional<'f' | 'c' | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    User.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        email: { type: DataTypes.STRING(200), allowNull: false, unique: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        passwordHash: { type: DataTypes.STRING(255), allowNull: false },
        role: { type: DataTypes.ENUM('owner', 'fitter', 'player'), allowNull: false },
        active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        units: { type: DataTypes.ENUM('imperial', 'metric'), allowNull: false, defaultValue: 'imperial' },
        tokenVersion: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        // people made by staff, the demo or an accepted invitation are verified on creation
        emailVerifiedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: DataTypes.NOW },
        lengthUnit: { type: DataTypes.ENUM('in', 'cm'), allowNull: true, defaultValue: null },
        altitudeUnit: { type: DataTypes.ENUM('ft', 'm'), allowNull: true, defaultValue: null },
        temperatureUnit: { type: DataTypes.ENUM('f', 'c'), allowNull: true, defaultValue: null },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'users' },
    );
  }
}
