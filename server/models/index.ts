import type { Sequelize } from 'sequelize';
import { Fitting } from './fitting';
import { Player } from './player';
import { Shop } from './shop';
import { User } from './user';

export { Fitting, Player, Shop, User };

/** Registers every model and association on one Sequelize instance. */
export function initModels(sequelize: Sequelize): void {
  Shop.initModel(sequelize);
  User.initModel(sequelize);
  Player.initModel(sequelize);
  Fitting.initModel(sequelize);

  Shop.hasMany(User, { foreignKey: 'shopId' });
  User.belongsTo(Shop, { foreignKey: 'shopId', as: 'shop' });
  Shop.hasMany(Player, { foreignKey: 'shopId' });
  Player.belongsTo(Shop, { foreignKey: 'shopId' });
  Player.belongsTo(User, { foreignKey: 'userId', as: 'user' });
  Player.hasMany(Fitting, { foreignKey: 'playerId', as: 'fittings' });
  Fitting.belongsTo(Player, { foreignKey: 'playerId', as: 'player' });
  Fitting.belongsTo(User, { foreignKey: 'fitterId', as: 'fitter' });
  Fitting.belongsTo(Shop, { foreignKey: 'shopId' });
}
