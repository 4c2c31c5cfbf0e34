import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const uuidPk = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
const fk = (table: string, onDelete: 'CASCADE' | 'SET NULL', allowNull = false) => ({
  type: DataTypes.UUID,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
  onUpdate: 'CASCADE',
});
const lengthUnit = () => ({ type: DataTypes.ENUM('in', 'cm'), allowNull: true });
const altitudeUnit = () => ({ type: DataTypes.ENUM('ft', 'm'), allowNull: true });
const temperatureUnit = () => ({ type: DataTypes.ENUM('f', 'c'), allowNull: true });

/**
 * Shops that sign themselves up and close themselves down; people invited by e-mail.
 * - shops: closed_at / purge_after (a closed shop's data is deleted after purge_after), the
 *   units new people start with (default_units, and per quantity: null follows default_units).
 * - users: email_verified_at (an owner who signed up cannot sign in before it; everyone who
 *   existed before this migration counts as verified), per-quantity unit choices (null: follow
 *   `units`).
 * - players, fittings: archived_at (hidden from lists unless asked for).
 * - email_verifications: the sign-up link (only its SHA-256 kept, expiry, used once).
 * - invitations: a fitter or a player asked by e-mail to set a password (hash, expiry, used,
 *   revoked).
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('shops', 'closed_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn('shops', 'purge_after', { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn('shops', 'default_units', { type: DataTypes.ENUM('imperial', 'metric'), allowNull: false, defaultValue: 'imperial' });
  await qi.addColumn('shops', 'default_length_unit', lengthUnit());
  await qi.addColumn('shops', 'default_altitude_unit', altitudeUnit());
  await qi.addColumn('shops', 'default_temperature_unit', temperatureUnit());
  await qi.addIndex('shops', ['purge_after']);

  await qi.addColumn('users', 'email_verified_at', { type: DataTypes.DATE, allowNull: true });
  await qi.sequelize.query('UPDATE users SET email_verified_at = created_at', { type: QueryTypes.UPDATE });
  await qi.addColumn('users', 'length_unit', lengthUnit());
  await qi.addColumn('users', 'altitude_unit', altitudeUnit());
  await qi.addColumn('users', 'temperature_unit', temperatureUnit());

  await qi.addColumn('players', 'archived_at', { type: DataTypes.DATE, allowNull: true });
  await qi.addColumn('fittings', 'archived_at', { type: DataTypes.DATE, allowNull: true });

  await qi.createTable('email_verifications', {
    id: uuidPk,
    user_id: fk('users', 'CASCADE'),
    /** SHA-256 of the token in the e-mailed link; the token itself is never stored. */
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('email_verifications', ['user_id']);

  await qi.createTable('invitations', {
    id: uuidPk,
    shop_id: fk('shops', 'CASCADE'),
    role: { type: DataTypes.ENUM('fitter', 'player'), allowNull: false },
    email: { type: DataTypes.STRING(200), allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    /** The player profile the sign-in is for (player invitations). */
    player_id: fk('players', 'CASCADE', true),
    invited_by: fk('users', 'SET NULL', true),
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    sent_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('invitations', ['shop_id', 'role']);
  await qi.addIndex('invitations', ['player_id']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('invitations');
  await qi.dropTable('email_verifications');
  await qi.removeColumn('fittings', 'archived_at');
  await qi.removeColumn('players', 'archived_at');
  for (const c of ['temperature_unit', 'altitude_unit', 'length_unit', 'email_verified_at']) await qi.removeColumn('users', c);
  for (const c of ['default_temperature_unit', 'default_altitude_unit', 'default_length_unit', 'default_units', 'purge_after', 'closed_at']) await qi.removeColumn('shops', c);
}
