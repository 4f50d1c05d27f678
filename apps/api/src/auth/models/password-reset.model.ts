import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { User } from '../../users/models/user.model';

/** A forgotten-password link: the SHA-256 of its secret, when it expires, when it was used. */
@Table({ tableName: 'password_resets', updatedAt: false })
export class PasswordReset extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'user_id' })
  declare userId: number;

  @Column({ type: DataType.CHAR(64), allowNull: false, field: 'token_hash' })
  declare tokenHash: string;

  @Column({ type: DataType.DATE(3), allowNull: false, field: 'expires_at' })
  declare expiresAt: Date;

  @Column({ type: DataType.DATE(3), allowNull: true, field: 'used_at' })
  declare usedAt: Date | null;

  @BelongsTo(() => User)
  declare user?: User;

  declare createdAt: Date;
}
