import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Fitting } from './fitting';

/** One head build under test in a fitting, found by (club, label) on its shots. */
export class Build extends Model<InferAttributes<Build>, InferCreationAttributes<Build>> {
  declare id: CreationOptional<string>;
  declare fittingId: ForeignKey<Fitting['id']>;
  declare club: string;
  declare label: string;
  declare head: CreationOptional<string | null>;
  declare loftDeg: CreationOptional<number | null>;
  declare hoselSetting: CreationOptional<string | null>;
  declare lieDeg: CreationOptional<number | null>;
  declare lengthIn: CreationOptional<number | null>;
  declare shaft: CreationOptional<string | null>;
  declare shaftWeightG: CreationOptional<number | null>;
  declare shaftFlex: CreationOptional<string | null>;
  declare torqueDeg: CreationOptional<number | null>;
  declare grip: CreationOptional<string | null>;
  declare swingWeight: CreationOptional<string | null>;
  declare addedMassG: CreationOptional<number | null>;
  declare addedMassWhere: CreationOptional<string | null>;
  declare notes: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    const text = (n: number) => ({ type: DataTypes.STRING(n), allowNull: true });
    // A fresh object per attribute: Sequelize writes the attribute's name into it.
    const num = () => ({ type: DataTypes.DOUBLE, allowNull: true });
    Build.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        club: { type: DataTypes.STRING(40), allowNull: false },
        label: { type: DataTypes.STRING(80), allowNull: false },
        head: text(120),
        loftDeg: num(),
        hoselSetting: text(60),
        lieDeg: num(),
        lengthIn: num(),
        shaft: text(120),
        shaftWeightG: num(),
        shaftFlex: text(20),
        torqueDeg: num(),
        grip: text(120),
        swingWeight: text(10),
        addedMassG: num(),
        addedMassWhere: text(60),
        notes: { type: DataTypes.TEXT, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'builds' },
    );
  }
}
