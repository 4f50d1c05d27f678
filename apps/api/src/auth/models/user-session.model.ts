import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { User } from '../../users/models/user.model';

/** One sign-in: ended by signing out, by signing out everywhere, a password reset or a deactivation. */
@Table({ tableName: 'user_sessions', updatedAt: false })
export class UserSession extends Model {
  @Column({ type: DataType.CHAR(36), primaryKey: true })
  declare id: string;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'user_id' })
  declare userId: number;

  /** SHA-256 (hex) of the secret in the browser's session cookie. */
  @Column({ type: DataType.CHAR(64), allowNull: false, field: 'secret_hash' })
  declare secretHash: string;

  @Column({ type: DataType.DATE(3), allowNull: false, field: 'last_used_at' })
  declare lastUsedAt: Date;

  @Column({ type: DataType.DATE(3), allowNull: false, field: 'expires_at' })
  declare expiresAt: Date;

  @Column({ type: DataType.DATE(3), allowNull: true, field: 'revoked_at' })
  declare revokedAt: Date | null;

  /** Why it ended: signed-out, signed-out-everywhere, password-changed, password-reset, deactivated. */
  @Column({ type: DataType.STRING(40), allowNull: true, field: 'revoked_reason' })
  declare revokedReason: string | null;

  @Column({ type: DataType.STRING(200), allowNull: true, field: 'user_agent' })
  declare userAgent: string | null;

  @Column({ type: DataType.STRING(64), allowNull: true })
  declare address: string | null;

  @BelongsTo(() => User)
  declare user?: User;

  declare createdAt: Date;
}
