import { DataTypes, type QueryInterface } from 'sequelize';

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
const num = () => ({ type: DataTypes.DOUBLE, allowNull: true });
const text = (n: number) => ({ type: DataTypes.STRING(n), allowNull: true });

/** Spec columns a fitting's build lacked before: hosel changes, grip size, total weight, balance point. */
const NEW_BUILD_COLUMNS = {
  hosel_loft_change_deg: num,
  hosel_lie_change_deg: num,
  hosel_face_change_deg: num,
  grip_size: () => text(40),
  total_weight_g: num,
  balance_point_in: num,
} as const;

/** Every spec column of a build, for the bag's clubs. */
const specColumns = () => ({
  head: text(120),
  loft_deg: num(),
  hosel_setting: text(60),
  hosel_loft_change_deg: num(),
  hosel_lie_change_deg: num(),
  hosel_face_change_deg: num(),
  lie_deg: num(),
  length_in: num(),
  shaft: text(120),
  shaft_weight_g: num(),
  shaft_flex: text(20),
  torque_deg: num(),
  grip: text(120),
  grip_size: text(40),
  swing_weight: text(10),
  total_weight_g: num(),
  balance_point_in: num(),
  added_mass_g: num(),
  added_mass_where: text(60),
  notes: { type: DataTypes.TEXT, allowNull: true },
});

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  for (const [name, column] of Object.entries(NEW_BUILD_COLUMNS)) await qi.addColumn('builds', name, column());

  await qi.createTable('bag_clubs', {
    id: uuidPk,
    shop_id: fk('shops', 'CASCADE'),
    player_id: fk('players', 'CASCADE'),
    club: { type: DataTypes.STRING(40), allowNull: false },
    ...specColumns(),
    status: { type: DataTypes.ENUM('in-bag', 'on-order', 'out'), allowNull: false, defaultValue: 'in-bag' },
    carry_entered_m: num(),
    in_bag_since: { type: DataTypes.DATEONLY, allowNull: true },
    rounds_since: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    practice_sessions_since: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    source_build_id: fk('builds', 'SET NULL', true),
    source_fitting_id: fk('fittings', 'SET NULL', true),
    /** Optimistic concurrency: every save raises it; a save naming an older one is refused. */
    version: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 1 },
    ...timestamps,
  });
  await qi.addIndex('bag_clubs', ['player_id', 'status']);

  await qi.createTable('bag_club_history', {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    bag_club_id: fk('bag_clubs', 'CASCADE'),
    shop_id: fk('shops', 'CASCADE'),
    player_id: fk('players', 'CASCADE'),
    action: { type: DataTypes.ENUM('add', 'update', 'replace', 'out', 'wear'), allowNull: false },
    changed_at: { type: DataTypes.DATE(3), allowNull: false },
    changed_by: fk('users', 'SET NULL', true),
    fitting_id: fk('fittings', 'SET NULL', true),
    /** The club's whole state after the change (JSON). */
    snapshot: { type: DataTypes.TEXT, allowNull: false },
  });
  await qi.addIndex('bag_club_history', ['player_id', 'changed_at']);
  await qi.addIndex('bag_club_history', ['bag_club_id', 'id']);

  await qi.createTable('chosen_builds', {
    id: uuidPk,
    fitting_id: fk('fittings', 'CASCADE'),
    build_id: fk('builds', 'CASCADE'),
    club: { type: DataTypes.STRING(40), allowNull: false },
    replaces_bag_club_id: fk('bag_clubs', 'SET NULL', true),
    ...timestamps,
  });
  await qi.addIndex('chosen_builds', ['fitting_id', 'club'], { unique: true });

  await qi.createTable('chosen_take_outs', {
    id: uuidPk,
    fitting_id: fk('fittings', 'CASCADE'),
    bag_club_id: fk('bag_clubs', 'CASCADE'),
    ...timestamps,
  });
  await qi.addIndex('chosen_take_outs', ['fitting_id', 'bag_club_id'], { unique: true });

  await qi.createTable('chosen_build_confirmations', {
    fitting_id: { ...fk('fittings', 'CASCADE'), primaryKey: true },
    confirmed_by: fk('users', 'SET NULL', true),
    confirmed_at: { type: DataTypes.DATE, allowNull: false },
    ...timestamps,
  });

  await qi.createTable('spec_sheets', {
    id: uuidPk,
    shop_id: fk('shops', 'CASCADE'),
    fitting_id: { ...fk('fittings', 'CASCADE'), unique: true },
    player_id: fk('players', 'CASCADE'),
    state: { type: DataTypes.ENUM('sent', 'accepted'), allowNull: false },
    /** The sheet as sent (JSON): what the player reads and accepts. */
    content: { type: DataTypes.TEXT('long'), allowNull: false },
    sent_at: { type: DataTypes.DATE, allowNull: false },
    sent_by: fk('users', 'SET NULL', true),
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    accepted_by: fk('users', 'SET NULL', true),
    ...timestamps,
  });

  await qi.createTable('workshop_settings', {
    shop_id: { ...fk('shops', 'CASCADE'), primaryKey: true },
    wedge_wear_rounds: { type: DataTypes.INTEGER, allowNull: false },
    wedge_wear_practice_sessions: { type: DataTypes.INTEGER, allowNull: false },
    static_fit_table: { type: DataTypes.TEXT, allowNull: false },
    updated_by: fk('users', 'SET NULL', true),
    ...timestamps,
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('workshop_settings');
  await qi.dropTable('spec_sheets');
  await qi.dropTable('chosen_build_confirmations');
  await qi.dropTable('chosen_take_outs');
  await qi.dropTable('chosen_builds');
  await qi.dropTable('bag_club_history');
  await qi.dropTable('bag_clubs');
  for (const name of Object.keys(NEW_BUILD_COLUMNS)) await qi.removeColumn('builds', name);
}
