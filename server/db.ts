import { Sequelize } from 'sequelize';
import type { Config } from './config';
import { initModels } from './models';

/** A Sequelize instance on MariaDB with every model registered. No connection is made yet. */
export function createSequelize(db: Config['db'], options: { logging?: boolean } = {}): Sequelize {
  const sequelize = new Sequelize(db.name, db.user, db.password, {
    dialect: 'mariadb',
    host: db.host,
    port: db.port,
    logging: options.logging ? (sql) => console.log(sql) : false,
    define: { underscored: true },
    pool: { max: 10, min: 0, idle: 10_000 },
    dialectOptions: { connectTimeout: 10_000 },
    timezone: '+00:00',
  });
  initModels(sequelize);
  return sequelize;
}
