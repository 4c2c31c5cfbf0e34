import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * A shop's decision settings: its own head-to-head margins per field (canonical units, JSON; a
 * field left out keeps the default) and its defaults for the on-target odds. One row per shop,
 * made when the owner first saves.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('shop_margins', {
    shop_id: { type: DataTypes.UUID, primaryKey: true, allowNull: false, references: { model: 'shops', key: 'id' }, onDelete: 'CASCADE' },
    margins: { type: DataTypes.TEXT, allowNull: false },
    fairway_width_m: { type: DataTypes.DOUBLE, allowNull: true },
    green_radius_m: { type: DataTypes.DOUBLE, allowNull: true },
    updated_by: { type: DataTypes.UUID, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('shop_margins');
}
