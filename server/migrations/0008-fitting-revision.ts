import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * fittings.revision: raised in the same transaction as every change to what a fitting's
 * analysis is computed from (bay files, shots and their decisions, builds, the fitting's
 * conditions). Every server process reads it from here, so answers cached in one process's
 * memory are keyed by a revision all processes agree on.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.addColumn('fittings', 'revision', { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.removeColumn('fittings', 'revision');
}
