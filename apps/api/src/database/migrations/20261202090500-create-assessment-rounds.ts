import { DataTypes, type QueryInterface } from 'sequelize';

// Assessment rounds (day offset from the trial's start) and the measures taken in each.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('assessment_rounds', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    trial_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'trials', key: 'id' }, onDelete: 'CASCADE' },
    label: { type: DataTypes.STRING(60), allowNull: false },
    day_offset: { type: DataTypes.SMALLINT, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await queryInterface.addIndex('assessment_rounds', ['trial_id', 'label'], { unique: true, name: 'assessment_rounds_label' });
  await queryInterface.createTable('round_measures', {
    round_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true, references: { model: 'assessment_rounds', key: 'id' }, onDelete: 'CASCADE' },
    measure_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true, references: { model: 'measures', key: 'id' }, onDelete: 'CASCADE' },
  });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('round_measures');
  await queryInterface.dropTable('assessment_rounds');
}
