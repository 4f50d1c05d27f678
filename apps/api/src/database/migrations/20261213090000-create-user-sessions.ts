import { DataTypes, type QueryInterface } from 'sequelize';

// Sign-in sessions: one row per sign-in, revocable, so signing out everywhere, a password reset, a
// deactivation or a removal takes effect on the next request. The browser's cookie holds a secret whose
// SHA-256 is kept here; access tokens name their session.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('user_sessions', {
    id: { type: DataTypes.CHAR(36), primaryKey: true },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    secret_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    last_used_at: { type: DataTypes.DATE(3), allowNull: false },
    expires_at: { type: DataTypes.DATE(3), allowNull: false },
    revoked_at: { type: DataTypes.DATE(3), allowNull: true },
    revoked_reason: { type: DataTypes.STRING(40), allowNull: true },
    user_agent: { type: DataTypes.STRING(200), allowNull: true },
    address: { type: DataTypes.STRING(64), allowNull: true },
  });
  await queryInterface.addIndex('user_sessions', ['user_id', 'revoked_at'], { name: 'user_sessions_user' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('user_sessions');
}
