/**
 * Hardening: column types that hold what the import limits allow, one rule for club and build
 * names (compared exactly, in code and in the database), server-side sessions, and the shared
 * rate-limit counters of rate-limiter-flexible.
 */
import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

const raw = (qi: QueryInterface, sql: string) => qi.sequelize.query(sql, { type: QueryTypes.RAW });

// Exact comparison, trailing spaces included (a PAD SPACE collation would call "Steel" and
// "Steel " equal). The unique index on builds then agrees with the import's own grouping.
const EXACT = 'CHARACTER SET utf8mb4 COLLATE utf8mb4_nopad_bin';
const FOLDED = 'CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci';

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  // A recipe maps up to 1,000 columns with headers up to 200 characters (analysis/import/import-limits.ts):
  // a few hundred kilobytes of JSON, more than TEXT's 64 KiB. A report lists up to 1,000 rejected rows
  // and one group per (club, build) of up to 200,000 rows: LONGTEXT.
  await qi.changeColumn('recipes', 'recipe', { type: DataTypes.TEXT('medium'), allowNull: false });
  await qi.changeColumn('bay_files', 'recipe', { type: DataTypes.TEXT('medium'), allowNull: false });
  await qi.changeColumn('bay_files', 'report', { type: DataTypes.TEXT('long'), allowNull: false });
  await raw(qi, `ALTER TABLE builds MODIFY club VARCHAR(40) ${EXACT} NOT NULL, MODIFY label VARCHAR(80) ${EXACT} NOT NULL`);
  await raw(qi, `ALTER TABLE shots MODIFY club VARCHAR(40) ${EXACT} NOT NULL, MODIFY build VARCHAR(80) ${EXACT} NULL`);

  await qi.createTable('sessions', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    user_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    /** Set at sign-out (or sign-out everywhere, a password reset): the token of this session stops working. */
    ended_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('sessions', ['user_id']);

  // The table rate-limiter-flexible's MySQL store uses (its own layout), shared by every API process.
  await raw(
    qi,
    'CREATE TABLE rate_limits (`key` VARCHAR(255) CHARACTER SET utf8mb4 COLLATE utf8mb4_bin NOT NULL, `points` INT NOT NULL DEFAULT 0, `expire` BIGINT UNSIGNED NULL, PRIMARY KEY (`key`), KEY rate_limits_expire (`expire`)) ENGINE = InnoDB',
  );
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('rate_limits');
  await qi.dropTable('sessions');
  await raw(qi, `ALTER TABLE shots MODIFY club VARCHAR(40) ${FOLDED} NOT NULL, MODIFY build VARCHAR(80) ${FOLDED} NULL`);
  await raw(qi, `ALTER TABLE builds MODIFY club VARCHAR(40) ${FOLDED} NOT NULL, MODIFY label VARCHAR(80) ${FOLDED} NOT NULL`);
  await qi.changeColumn('bay_files', 'report', { type: DataTypes.TEXT('medium'), allowNull: false });
  await qi.changeColumn('bay_files', 'recipe', { type: DataTypes.TEXT, allowNull: false });
  await qi.changeColumn('recipes', 'recipe', { type: DataTypes.TEXT, allowNull: false });
}
