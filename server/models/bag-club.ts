import { DataTypes, Model, type CreationOptional, type ForeignKey, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Build } from './build';
import type { Fitting } from './fitting';
import type { Player } from './player';
import type { Shop } from './shop';
import { specAttributes } from './spec-attributes';

/** One club of a player's bag with its build spec, status and carry; every change goes to BagClubHistory. */
export class BagClub extends Model<InferAttributes<BagClub>, InferCreationAttributes<BagClub>> {
  declare id: CreationOptional<string>;
  declare shopId: Shop['id'];
  declare playerId: Player['id'];
  declare club: string;
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
  declare status: CreationOptional<'in-bag' | 'on-order' | 'out'>;
  declare carryEnteredM: CreationOptional<number | null>;
  declare inBagSince: CreationOptional<string | null>;
  declare roundsSince: CreationOptional<number>;
  declare practiceSessionsSince: CreationOptional<number>;
  declare sourceBuildId: CreationOptional<ForeignKey<Build['id']> | null>;
  declare sourceFittingId: CreationOptional<ForeignKey<Fitting['id']> | null>;
  declare version: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    BagClub.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        shopId: { type: DataTypes.UUID, allowNull: false },
        playerId: { type: DataTypes.UUID, allowNull: false },
        club: { type: DataTypes.STRING(40), allowNull: false },
        ...specAttributes(),
        status: { type: DataTypes.ENUM('in-bag', 'on-order', 'out'), allowNull: false, defaultValue: 'in-bag' },
        carryEnteredM: { type: DataTypes.DOUBLE, allowNull: true },
        inBagSince: { type: DataTypes.DATEONLY, allowNull: true },
        roundsSince: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        practiceSessionsSince: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        sourceBuildId: { type: DataTypes.UUID, allowNull: true },
        sourceFittingId: { type: DataTypes.UUID, allowNull: true },
        version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'bag_clubs' },
    );
  }
}
