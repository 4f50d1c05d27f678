import { DataTypes, QueryTypes, type QueryInterface } from 'sequelize';

// The protocol's own fields on the trial: question, start date, seed, safety notes, no-control reason.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.addColumn('trials', 'question', { type: DataTypes.TEXT, allowNull: true });
  await queryInterface.addColumn('trials', 'start_date', { type: DataTypes.DATEONLY, allowNull: true });
  await queryInterface.addColumn('trials', 'seed', { type: DataTypes.STRING(60), allowNull: false, defaultValue: 'friable' });
  await queryInterface.addColumn('trials', 'safety_notes', { type: DataTypes.TEXT, allowNull: true });
  await queryInterface.addColumn('trials', 'no_control_reason', { type: DataTypes.STRING(500), allowNull: true });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  // One ALTER with an explicit query type: removeColumn's untyped query trips over the mariadb driver's result meta.
  await queryInterface.sequelize.query(
    'ALTER TABLE `trials` DROP COLUMN `no_control_reason`, DROP COLUMN `safety_notes`, DROP COLUMN `seed`, DROP COLUMN `start_date`, DROP COLUMN `question`',
    { type: QueryTypes.RAW },
  );
}
