import { DataTypes, type QueryInterface } from 'sequelize';

/** A fitting's ground firmness (soft, normal, firm): the ground the ball runs on, for total and roll. */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('fittings', 'ground_firmness', { type: DataTypes.ENUM('soft', 'normal', 'firm'), allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('fittings', 'ground_firmness');
}
