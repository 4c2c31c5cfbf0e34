import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

const uuidFk = (table: string, onDelete: 'CASCADE' | 'SET NULL', allowNull = false) => ({
  type: DataTypes.UUID,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
  onUpdate: 'CASCADE',
});

/** The steps of a fitting's course, in order (server/schemas/fitting-course.ts names them too). */
const STEPS = ['requested', 'intake-done', 'in-progress', 'recommendation-sent', 'accepted', 'built', 'delivered'];

/**
 * Remote fittings: the course of a fitting (its step on the fitting, each change dated), the
 * player's intake, messages between player and fitter with a read marker per person, and a
 * shop's public request link.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('fittings', 'course_step', { type: DataTypes.ENUM(...STEPS), allowNull: false, defaultValue: 'in-progress' });
  await qi.addIndex('fittings', ['shop_id', 'course_step']);
  // Fittings with a sheet already sent or accepted stand at that step.
  await qi.sequelize.query(
    `UPDATE fittings f JOIN spec_sheets s ON s.fitting_id = f.id
       SET f.course_step = IF(s.state = 'accepted', 'accepted', 'recommendation-sent')`,
    { type: QueryTypes.UPDATE },
  );

  await qi.createTable('fitting_course_steps', {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    fitting_id: uuidFk('fittings', 'CASCADE'),
    shop_id: uuidFk('shops', 'CASCADE'),
    step: { type: DataTypes.ENUM(...STEPS), allowNull: false },
    /** forward: the next step; back: an earlier one, with a reason. */
    direction: { type: DataTypes.ENUM('forward', 'back'), allowNull: false },
    reason: { type: DataTypes.STRING(500), allowNull: true },
    at: { type: DataTypes.DATE(3), allowNull: false },
    by_user_id: uuidFk('users', 'SET NULL', true),
  });
  await qi.addIndex('fitting_course_steps', ['fitting_id', 'id']);

  await qi.createTable('fitting_intakes', {
    fitting_id: { ...uuidFk('fittings', 'CASCADE'), primaryKey: true },
    shop_id: uuidFk('shops', 'CASCADE'),
    player_id: uuidFk('players', 'CASCADE'),
    handedness: { type: DataTypes.ENUM('right', 'left'), allowNull: false },
    height_cm: { type: DataTypes.DOUBLE, allowNull: false },
    wrist_to_floor_cm: { type: DataTypes.DOUBLE, allowNull: false },
    handicap: { type: DataTypes.DOUBLE, allowNull: true },
    usual_miss: { type: DataTypes.STRING(200), allowNull: true },
    ball_flight_now: { type: DataTypes.STRING(300), allowNull: true },
    ball_flight_wanted: { type: DataTypes.STRING(300), allowNull: true },
    wishes: { type: DataTypes.TEXT, allowNull: true },
    submitted_at: { type: DataTypes.DATE, allowNull: false },
    submitted_by: uuidFk('users', 'SET NULL', true),
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });

  await qi.createTable('fitting_messages', {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    fitting_id: uuidFk('fittings', 'CASCADE'),
    shop_id: uuidFk('shops', 'CASCADE'),
    author_id: uuidFk('users', 'SET NULL', true),
    author_name: { type: DataTypes.STRING(120), allowNull: false },
    from_player: { type: DataTypes.BOOLEAN, allowNull: false },
    body: { type: DataTypes.TEXT, allowNull: false },
    at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('fitting_messages', ['fitting_id', 'id']);

  await qi.createTable('fitting_message_reads', {
    fitting_id: { ...uuidFk('fittings', 'CASCADE'), primaryKey: true },
    user_id: { ...uuidFk('users', 'CASCADE'), primaryKey: true },
    /** The last message this person has seen. */
    last_read_id: { type: DataTypes.BIGINT, allowNull: false },
  });

  await qi.createTable('shop_request_links', {
    shop_id: { ...uuidFk('shops', 'CASCADE'), primaryKey: true },
    slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('shop_request_links');
  await qi.dropTable('fitting_message_reads');
  await qi.dropTable('fitting_messages');
  await qi.dropTable('fitting_intakes');
  await qi.dropTable('fitting_course_steps');
  await qi.removeIndex('fittings', ['shop_id', 'course_step']);
  await qi.removeColumn('fittings', 'course_step');
}
