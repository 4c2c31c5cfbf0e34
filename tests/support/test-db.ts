/**
 * Per-test-file database in the throwaway MariaDB of the global setup: a fresh schema through
 * the real migrations, a Sequelize instance and an app with test config.
 */
import { randomBytes } from 'node:crypto';
import { Sequelize } from 'sequelize';
import { closeApp, createApp } from '@/server/app';
import { loadConfig, type Config } from '@/server/config';
import { createSequelize } from '@/server/db';
import { migrateUp } from '@/server/migrate';

export interface TestContext {
  sequelize: Sequelize;
  config: Config;
  app: ReturnType<typeof createApp>;
  close: () => Promise<void>;
}

export function testDbSettings(name: string): Config['db'] {
  const port = Number(process.env.OVALYARD_TEST_DB_PORT);
  if (!port) throw new Error('No test database: run through jest (globalSetup starts it)');
  return {
    host: '127.0.0.1',
    port,
    name,
    user: process.env.OVALYARD_TEST_DB_USER ?? 'ovalyard_test',
    password: process.env.OVALYARD_TEST_DB_PASSWORD ?? '',
  };
}

/** Creates an empty database with a random name and migrates it. */
export async function createTestDatabase(): Promise<{ sequelize: Sequelize; db: Config['db']; drop: () => Promise<void> }> {
  const name = `t_${randomBytes(6).toString('hex')}`;
  const db = testDbSettings(name);
  const admin = new Sequelize('', db.user, db.password, { dialect: 'mariadb', host: db.host, port: db.port, logging: false });
  await admin.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  const sequelize = createSequelize(db);
  await migrateUp(sequelize);
  return {
    sequelize,
    db,
    drop: async () => {
      await sequelize.close();
      await admin.query(`DROP DATABASE IF EXISTS \`${name}\``);
      await admin.close();
    },
  };
}

export async function createTestContext(env: Record<string, string> = {}): Promise<TestContext> {
  const { sequelize, db, drop } = await createTestDatabase();
  const config = loadConfig({
    NODE_ENV: 'test',
    JWT_SECRET: 'test-secret-test-secret-test-secret-00',
    SIGN_IN_LIMIT: '1000',
    DB_PORT: String(db.port),
    DB_NAME: db.name,
    DB_USER: db.user,
    DB_PASSWORD: db.password,
    ...env,
  });
  const app = createApp({ sequelize, config, log: process.env.TEST_LOG ? (m, e) => console.error(m, e) : () => {} });
  return {
    sequelize,
    config,
    app,
    close: async () => {
      await closeApp(app);
      await drop();
    },
  };
}
