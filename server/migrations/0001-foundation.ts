import { DataTypes, type QueryInterface } from 'sequelize';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const uuidPk = { type: DataTypes.UUID, primaryKey: true, allowNull: false };
const fk = (table: string, onDelete: 'CASCADE' | 'SET NULL' | 'RESTRICT', allowNull = false) => ({
  type: DataTypes.UUID,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
  onUpdate: 'CASCADE',
});

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('shops', {
    id: uuidPk,
    name: { type: DataTypes.STRING(160), allowNull: false },
    ...timestamps,
  });
  await qi.createTable('users', {
    id: uuidPk,
    shop_id: fk('shops', 'CASCADE'),
    email: { type: DataTypes.STRING(200), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    password_hash: { type: DataTypes.STRING(255), allowNull: false },
    role: { type: DataTypes.ENUM('owner', 'fitter', 'player'), allowNull: false },
    active: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
    units: { type: DataTypes.ENUM('imperial', 'metric'), allowNull: false, defaultValue: 'imperial' },
    token_version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    ...timestamps,
  });
  await qi.addIndex('users', ['shop_id', 'role']);
  await qi.createTable('players', {
    id: uuidPk,
    shop_id: fk('shops', 'CASCADE'),
    user_id: { ...fk('users', 'SET NULL', true), unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    email: { type: DataTypes.STRING(200), allowNull: true },
    handedness: { type: DataTypes.ENUM('right', 'left'), allowNull: false, defaultValue: 'right' },
    height_cm: { type: DataTypes.DOUBLE, allowNull: true },
    wrist_to_floor_cm: { type: DataTypes.DOUBLE, allowNull: true },
    handicap: { type: DataTypes.DOUBLE, allowNull: true },
    usual_miss: { type: DataTypes.STRING(200), allowNull: true },
    goals: { type: DataTypes.TEXT, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('players', ['shop_id', 'name']);
  await qi.createTable('fittings', {
    id: uuidPk,
    shop_id: fk('shops', 'CASCADE'),
    player_id: fk('players', 'CASCADE'),
    fitter_id: fk('users', 'SET NULL', true),
    date: { type: DataTypes.DATEONLY, allowNull: false },
    venue: { type: DataTypes.ENUM('indoor', 'outdoor'), allowNull: false, defaultValue: 'indoor' },
    temperature_c: { type: DataTypes.DOUBLE, allowNull: true },
    altitude_m: { type: DataTypes.DOUBLE, allowNull: true },
    humidity_pct: { type: DataTypes.DOUBLE, allowNull: true },
    ball: { type: DataTypes.STRING(120), allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    remote: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    ...timestamps,
  });
  await qi.addIndex('fittings', ['shop_id', 'date']);
  await qi.addIndex('fittings', ['player_id']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('fittings');
  await qi.dropTable('players');
  await qi.dropTable('users');
  await qi.dropTable('shops');
}
