/**
 * The private MariaDB lets root in only through its socket: over TCP on 127.0.0.1, root without a
 * password is refused (the throwaway server of the tests is started by the same code as npm start's).
 */
import { Sequelize } from 'sequelize';

describe('private MariaDB', () => {
  it('refuses root without a password over TCP on 127.0.0.1', async () => {
    const port = Number(process.env.OVALYARD_TEST_DB_PORT);
    const root = new Sequelize('', 'root', '', { dialect: 'mariadb', host: '127.0.0.1', port, logging: false, dialectOptions: { connectTimeout: 5000 } });
    await expect(root.authenticate()).rejects.toThrow(/Access denied/);
    await root.close();
  });
});
