import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Fitting } from './fitting';
import { specAttributes } from './spec-attributes';

/** One head build under test in a fitting, found by (club, label) on its shots. */
export class Build extends Model<InferAttributes<Build>, InferCreationAttributes<Build>> {
  declare id: CreationOptional<string>;
  declare fittingId: ForeignKey<Fitting['id']>;
  declare club: string;
  declare label: string;
  declare head: CreationOptional<string | null>;
  declare loftDeg: CreationOptional<number | null>;
  declare hoselSetting: CreationOptional<string | null>;
  declare hoselLoftChangeDeg: CreationOptional<number | null>;
  declare hoselLieChangeDeg: CreationOptional<number | null>;
  declare hoselFaceChangeDeg: CreationOptional<number | null>;
  declare lieDeg: CreationOptional<number | null>;
  declare lengthIn: CreationOptional<number | null>;
  declare shaft: CreationOptional<string | null>;
  declare shaftWeightG: CreationOptional<number | null>;
  declare shaftFlex: CreationOptional<string | null>;
  declare torqueDeg: CreationOptional<number | null>;
  declare grip: CreationOptional<string | null>;
  declare gripSize: CreationOptional<string | null>;
  declare swingWeight: CreationOptional<string | null>;
  declare totalWeightG: CreationOptional<number | null>;
  declare balancePointIn: CreationOptional<number | null>;
  declare addedMassG: CreationOptional<number | null>;
  declare addedMassWhere: CreationOptional<string | null>;
  declare notes: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Build.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        club: { type: DataTypes.STRING(40), allowNull: false },
        label: { type: DataTypes.STRING(80), allowNull: false },
        ...specAttributes(),
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'builds' },
    );
  }
}
