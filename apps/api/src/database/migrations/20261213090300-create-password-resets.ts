import { DataTypes, type QueryInterface } from 'sequelize';

// Forgotten-password links: only the SHA-256 of the e-mailed secret is kept; each works once and expires.
export async function up({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.createTable('password_resets', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    created_at: { type: DataTypes.DATE(3), allowNull: false },
    expires_at: { type: DataTypes.DATE(3), allowNull: false },
    used_at: { type: DataTypes.DATE(3), allowNull: true },
  });
  await queryInterface.addIndex('password_resets', ['user_id'], { name: 'password_resets_user' });
}

export async function down({ context: queryInterface }: { context: QueryInterface }): Promise<void> {
  await queryInterface.dropTable('password_resets');
}
