import { DataTypes, type QueryInterface } from 'sequelize';
import { SHOT_FIELDS } from '../../analysis/fields';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const snake = (s: string) => s.replace(/[A-Z]/g, (c) => `_${c.toLowerCase()}`);

export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('recipes', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    shop_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'shops', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(120), allowNull: false },
    recipe: { type: DataTypes.TEXT, allowNull: false },
    created_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    ...timestamps,
  });
  await qi.addIndex('recipes', ['shop_id', 'name'], { unique: true });

  await qi.createTable('bay_files', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    fitting_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'fittings', key: 'id' }, onDelete: 'CASCADE' },
    uploaded_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    file_name: { type: DataTypes.STRING(255), allowNull: false },
    content_hash: { type: DataTypes.CHAR(64), allowNull: false },
    raw_text: { type: DataTypes.TEXT('long'), allowNull: false },
    recipe: { type: DataTypes.TEXT, allowNull: false },
    report: { type: DataTypes.TEXT('medium'), allowNull: false },
    row_count: { type: DataTypes.INTEGER, allowNull: false },
    shot_count: { type: DataTypes.INTEGER, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('bay_files', ['fitting_id', 'content_hash'], { unique: true });

  const fieldColumns = Object.fromEntries(SHOT_FIELDS.map((f) => [snake(f), { type: DataTypes.DOUBLE, allowNull: true }]));
  await qi.createTable('shots', {
    id: { type: DataTypes.BIGINT, primaryKey: true, autoIncrement: true },
    bay_file_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'bay_files', key: 'id' }, onDelete: 'CASCADE' },
    fitting_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'fittings', key: 'id' }, onDelete: 'CASCADE' },
    row_number: { type: DataTypes.INTEGER, allowNull: false },
    club: { type: DataTypes.STRING(40), allowNull: false },
    build: { type: DataTypes.STRING(80), allowNull: true },
    ...fieldColumns,
    derived_mask: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    decision: { type: DataTypes.ENUM('keep', 'drop'), allowNull: true },
  });
  await qi.addIndex('shots', ['fitting_id', 'club', 'build']);
  await qi.addIndex('shots', ['bay_file_id', 'row_number']);

  await qi.createTable('builds', {
    id: { type: DataTypes.UUID, primaryKey: true, allowNull: false },
    fitting_id: { type: DataTypes.UUID, allowNull: false, references: { model: 'fittings', key: 'id' }, onDelete: 'CASCADE' },
    club: { type: DataTypes.STRING(40), allowNull: false },
    label: { type: DataTypes.STRING(80), allowNull: false },
    head: { type: DataTypes.STRING(120), allowNull: true },
    loft_deg: { type: DataTypes.DOUBLE, allowNull: true },
    hosel_setting: { type: DataTypes.STRING(60), allowNull: true },
    lie_deg: { type: DataTypes.DOUBLE, allowNull: true },
    length_in: { type: DataTypes.DOUBLE, allowNull: true },
    shaft: { type: DataTypes.STRING(120), allowNull: true },
    shaft_weight_g: { type: DataTypes.DOUBLE, allowNull: true },
    shaft_flex: { type: DataTypes.STRING(20), allowNull: true },
    torque_deg: { type: DataTypes.DOUBLE, allowNull: true },
    grip: { type: DataTypes.STRING(120), allowNull: true },
    swing_weight: { type: DataTypes.STRING(10), allowNull: true },
    added_mass_g: { type: DataTypes.DOUBLE, allowNull: true },
    added_mass_where: { type: DataTypes.STRING(60), allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('builds', ['fitting_id', 'club', 'label'], { unique: true });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('builds');
  await qi.dropTable('shots');
  await qi.dropTable('bay_files');
  await qi.dropTable('recipes');
}
