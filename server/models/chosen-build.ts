import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** The build a fitter chose for a club in a fitting, and the bag club it replaces (null: added). */
export class ChosenBuild extends Model<InferAttributes<ChosenBuild>, InferCreationAttributes<ChosenBuild>> {
  declare id: CreationOptional<string>;
  declare fittingId: string;
  declare buildId: string;
  declare club: string;
  declare replacesBagClubId: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ChosenBuild.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        fittingId: { type: DataTypes.UUID, allowNull: false },
        buildId: { type: DataTypes.UUID, allowNull: false },
        club: { type: DataTypes.STRING(40), allowNull: false },
        replacesBagClubId: { type: DataTypes.UUID, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'chosen_builds' },
    );
  }
}

/** A bag club the fitter takes out as part of a fitting's choice. */
export class ChosenTakeOut extends Model<InferAttributes<ChosenTakeOut>, InferCreationAttributes<ChosenTakeOut>> {
  declare id: CreationOptional<string>;
  declare fittingId: string;
  declare bagClubId: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ChosenTakeOut.init(
      {
        id: { type: DataTypes.UUID, defaultValue: DataTypes.UUIDV4, primaryKey: true },
        fittingId: { type: DataTypes.UUID, allowNull: false },
        bagClubId: { type: DataTypes.UUID, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'chosen_take_outs' },
    );
  }
}

/** The moment a fitter confirmed a fitting's chosen builds into the bag. */
export class ChosenBuildConfirmation extends Model<InferAttributes<ChosenBuildConfirmation>, InferCreationAttributes<ChosenBuildConfirmation>> {
  declare fittingId: string;
  declare confirmedBy: string | null;
  declare confirmedAt: Date;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ChosenBuildConfirmation.init(
      {
        fittingId: { type: DataTypes.UUID, primaryKey: true },
        confirmedBy: { type: DataTypes.UUID, allowNull: true },
        confirmedAt: { type: DataTypes.DATE, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'chosen_build_confirmations' },
    );
  }
}
