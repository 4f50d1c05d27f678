import { DataTypes, type QueryInterface } from 'sequelize';

// Invitations to join a trial by e-mail. Only the SHA-256 hash of the link's token is stored, so a
// copy of the database cannot be used to accept an invitation. Resending replaces the hash.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('invitations', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    trial_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'trials', key: 'id' },
      onDelete: 'CASCADE',
    },
    email: { type: DataTypes.STRING(254), allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false },
    site_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'sites', key: 'id' },
      onDelete: 'CASCADE',
    },
    message: { type: DataTypes.STRING(1000), allowNull: true },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false },
    invited_by: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    sent_at: { type: DataTypes.DATE(3), allowNull: false },
    expires_at: { type: DataTypes.DATE(3), allowNull: false },
    accepted_at: { type: DataTypes.DATE(3), allowNull: true },
    accepted_by: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'SET NULL',
    },
    revoked_at: { type: DataTypes.DATE(3), allowNull: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    updated_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await queryInterface.addIndex('invitations', ['token_hash'], { unique: true, name: 'invitations_token_hash' });
  await queryInterface.addIndex('invitations', ['trial_id', 'email'], { name: 'invitations_trial_email' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('invitations');
}
