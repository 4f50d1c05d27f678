import { DataTypes, type QueryInterface } from 'sequelize';

// Sign-offs of a saved analysis, one per person: who (and in which role), when, their statement, and the
// data hash and engine version they signed, so a later change of the data shows against each sign-off.
// Earlier single investigator sign-offs are carried over with a statement saying so.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('analysis_sign_offs', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    trial_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'trials', key: 'id' }, onDelete: 'CASCADE' },
    snapshot_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'analysis_snapshots', key: 'id' }, onDelete: 'CASCADE' },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    signer_name: { type: DataTypes.STRING(120), allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false },
    statement: { type: DataTypes.STRING(1000), allowNull: false },
    data_hash: { type: DataTypes.CHAR(64), allowNull: false },
    engine_version: { type: DataTypes.STRING(40), allowNull: false },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('analysis_sign_offs', ['snapshot_id', 'user_id'], { name: 'analysis_sign_offs_signer', unique: true });
  await queryInterface.sequelize.query(
    `INSERT INTO analysis_sign_offs (trial_id, snapshot_id, user_id, signer_name, role, statement, data_hash, engine_version, created_at)
     SELECT s.trial_id, s.id, s.signed_off_by, COALESCE(u.name, 'unknown'), 'investigator',
            'Signed off before sign-offs carried a statement.', s.data_hash, s.engine_version, s.signed_off_at
     FROM analysis_snapshots s LEFT JOIN users u ON u.id = s.signed_off_by WHERE s.signed_off_at IS NOT NULL`,
  );
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('analysis_sign_offs');
}
