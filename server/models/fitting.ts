import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { CourseStep } from '../schemas';
import type { Player } from './player';
import type { Shop } from './shop';
import type { User } from './user';

export class Fitting extends Model<InferAttributes<Fitting>, InferCreationAttributes<Fitting>> {
  declare id: CreationOptional<string>;
  declare shopId: ForeignKey<Shop['id']>;
  declare playerId: ForeignKey<Player['id']>;
  declare fitterId: ForeignKey<User['id']> | null;
  declare date: string;
  declare venue: 'indoor' | 'outdoor';
  declare temperatureC: number | null;
  declare altitudeM: number | null;
  declare humidityPct: number | null;
  declare groundFirmness: 'soft' | 'normal' | 'firm' | null;
  declare ball: string | null;
  declare notes: string | null;
  declare remote: CreationOptional<boolean>;
  /** Raised with every change the analysis depends on (server/services/fitting-revision.ts). */
  declare revision: CreationOptional<number>;
  /** Where the fitting stands (migration 0010; server/services/fitting-course.ts moves it). */
  declare courseStep: CreationOptional<CourseStep>;
  /** Hidden from lists unless asked for. */
  declare archivedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  declare player?: NonAttribute<Player>;
  declare fitter?: NonAttribute<User | null>;

  static initModel(sequelize: Sequelize) {
    Fitting.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        date: { type: DataTypes.DATEONLY, allowNull: false },
        venue: { type: DataTypes.ENUM('indoor', 'outdoor'), allowNull: false, defaultValue: 'indoor' },
        temperatureC: { type: DataTypes.DOUBLE, allowNull: true },
        altitudeM: { type: DataTypes.DOUBLE, allowNull: true },
        humidityPct: { type: DataTypes.DOUBLE, allowNull: true },
        groundFirmness: { type: DataTypes.ENUM('soft', 'normal', 'firm'), allowNull: true },
        ball: { type: DataTypes.STRING(120), allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: true },
        remote: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        revision: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        courseStep: {
          type: DataTypes.ENUM('requested', 'intake-done', 'in-progress', 'recommendation-sent', 'accepted', 'built', 'delivered'),
          allowNull: false,
          defaultValue: 'in-progress',
        },
        archivedAt: { type: DataTypes.DATE, allowNull: true, defaultValue: null },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'fittings' },
    );
  }
}
