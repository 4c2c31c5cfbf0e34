import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Shop } from './shop';
import type { User } from './user';

export class Player extends Model<InferAttributes<Player>, InferCreationAttributes<Player>> {
  declare id: CreationOptional<string>;
  declare shopId: ForeignKey<Shop['id']>;
  /** The player's own sign-in, when they have one. */
  declare userId: ForeignKey<User['id']> | null;
  declare name: string;
  declare email: string | null;
  declare handedness: 'right' | 'left';
  declare heightCm: number | null;
  declare wristToFloorCm: number | null;
  declare handicap: number | null;
  declare usualMiss: string | null;
  declare goals: string | null;
  /** Hidden from lists unless asked for. */
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Player.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        name: { type: DataTypes.STRING(120), allowNull: false },
        email: { type: DataTypes.STRING(200), allowNull: true },
        handedness: { type: DataTypes.ENUM('right', 'left'), allowNull: false, defaultValue: 'right' },
        heightCm: { type: DataTypes.DOUBLE, allowNull: true },
        wristToFloorCm: { type: DataTypes.DOUBLE, allowNull: true },
        handicap: { type: DataTypes.DOUBLE, allowNull: true },
        usualMiss: { type: DataTypes.STRING(200), allowNull: true },
        goals: { type: DataTypes.TEXT, allowNull: true },
        archivedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'players' },
    );
  }
}
