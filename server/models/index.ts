import type { Sequelize } from 'sequelize';
import { BagClub } from './bag-club';
import { BagClubHistory } from './bag-club-history';
import { BayFile } from './bay-file';
import { Build } from './build';
import { EmailVerification } from './email-verification';
import { Invitation } from './invitation';
import { ChosenBuild, ChosenBuildConfirmation, ChosenTakeOut } from './chosen-build';
import { Fitting } from './fitting';
import { FittingCourseStep, FittingIntake, FittingMessageRead, FittingMessageRecord, initRemoteFittingModels, ShopRequestLink } from './fitting-course';
import { PasswordReset } from './password-reset';
import { Player } from './player';
import { Recipe } from './recipe';
import { Session } from './session';
import { Shop } from './shop';
import { SpecSheetRecord } from './spec-sheet';
import { ShopMargins } from './shop-margins';
import { User } from './user';
import { WorkshopSettingsRecord } from './workshop-settings';

export { BayFile, Build, Fitting, PasswordReset, Player, Recipe, Session, Shop, ShopMargins, User };
export { FittingCourseStep, FittingIntake, FittingMessageRead, FittingMessageRecord, ShopRequestLink };
export { EmailVerification, Invitation };
export { BagClub, BagClubHistory, ChosenBuild, ChosenBuildConfirmation, ChosenTakeOut, SpecSheetRecord, WorkshopSettingsRecord };

/** Registers every model and association on one Sequelize instance. */
export function initModels(sequelize: Sequelize): void {
  Shop.initModel(sequelize);
  User.initModel(sequelize);
  Player.initModel(sequelize);
  Fitting.initModel(sequelize);
  BayFile.initModel(sequelize);
  Recipe.initModel(sequelize);
  Build.initModel(sequelize);
  PasswordReset.initModel(sequelize);
  initBagModels(sequelize);
  ShopMargins.initModel(sequelize);
  Session.initModel(sequelize);
  initRemoteFittingModels(sequelize);
  EmailVerification.initModel(sequelize);
  Invitation.initModel(sequelize);

  Shop.hasMany(User, { foreignKey: 'shopId' });
  User.belongsTo(Shop, { foreignKey: 'shopId', as: 'shop' });
  Shop.hasMany(Player, { foreignKey: 'shopId' });
  Player.belongsTo(Shop, { foreignKey: 'shopId' });
  Player.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Player.hasMany(Fitting, { foreignKey: 'playerId', as: 'fittings' });
  Fitting.belongsTo(Player, { foreignKey: 'playerId', as: 'player' });
  Fitting.belongsTo(User, { foreignKey: 'fitterId', as: 'fitter' });
  Fitting.belongsTo(Shop, { foreignKey: 'shopId' });
  Fitting.hasMany(BayFile, { foreignKey: 'fittingId', as: 'bayFiles' });
  BayFile.belongsTo(Fitting, { foreignKey: 'fittingId', as: 'fitting' });
  BayFile.belongsTo(User, { foreignKey: 'uploadedBy', as: 'uploader' });
  Fitting.hasMany(Build, { foreignKey: 'fittingId', as: 'builds' });
  Build.belongsTo(Fitting, { foreignKey: 'fittingId' });
  User.hasMany(PasswordReset, { foreignKey: 'userId' });
  PasswordReset.belongsTo(User, { foreignKey: 'userId' });
  User.hasMany(Session, { foreignKey: 'userId' });
  Session.belongsTo(User, { foreignKey: 'userId' });
  EmailVerification.belongsTo(User, { foreignKey: 'userId' });
  Invitation.belongsTo(Shop, { foreignKey: 'shopId', as: 'shop' });
  Invitation.belongsTo(Player, { foreignKey: 'playerId', as: 'player' });
  Invitation.belongsTo(User, { foreignKey: 'invitedBy', as: 'inviter' });
  Shop.hasMany(Recipe, { foreignKey: 'shopId' });
  Recipe.belongsTo(Shop, { foreignKey: 'shopId' });
  Recipe.belongsTo(User, { foreignKey: 'createdBy', as: 'creator' });
  ShopMargins.belongsTo(Shop, { foreignKey: 'shopId' });
  ShopMargins.belongsTo(User, { foreignKey: 'updatedBy', as: 'updater' });
}

/** The bag, chosen builds, spec sheets and workshop settings (migration 0007). */
function initBagModels(sequelize: Sequelize): void {
  BagClub.initModel(sequelize);
  BagClubHistory.initModel(sequelize);
  ChosenBuild.initModel(sequelize);
  ChosenTakeOut.initModel(sequelize);
  ChosenBuildConfirmation.initModel(sequelize);
  SpecSheetRecord.initModel(sequelize);
  WorkshopSettingsRecord.initModel(sequelize);
  Player.hasMany(BagClub, { foreignKey: 'playerId', as: 'bagClubs' });
  BagClub.belongsTo(Player, { foreignKey: 'playerId', as: 'player' });
  BagClub.hasMany(BagClubHistory, { foreignKey: 'bagClubId', as: 'history' });
  BagClubHistory.belongsTo(User, { foreignKey: 'changedBy', as: 'changer' });
}
