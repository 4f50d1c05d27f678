import { DataTypes, type QueryInterface } from 'sequelize';

// The protocol's own fields on the trial: question, start date, seed, safety notes, no-control reason.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.addColumn('trials', 'question', { type: DataTypes.TEXT, allowNull: true });
  await queryInterface.addColumn('trials', 'start_date', { type: DataTypes.DATEONLY, allowNull: true });
  await queryInterface.addColumn('trials', 'seed', { type: DataTypes.STRING(60), allowNull: false, defaultValue: 'friable' });
  await queryInterface.addColumn('trials', 'safety_notes', { type: DataTypes.TEXT, allowNull: true });
  await queryInterface.addColumn('trials', 'no_control_reason', { type: DataTypes.STRING(500), allowNull: true });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  for (const column of ['no_control_reason', 'safety_notes', 'seed', 'start_date', 'question']) {
    await queryInterface.removeColumn('trials', column);
  }
}
