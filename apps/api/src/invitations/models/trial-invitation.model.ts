import { TRIAL_ROLES, type TrialRole } from '@friable/contracts';
import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Trial } from '../../trials/models/trial.model';
import { User } from '../../users/models/user.model';

export { TRIAL_ROLES, type TrialRole };

/** An invitation to join a trial; the link's token is known only by its SHA-256 hash. */
@Table({ tableName: 'invitations' })
export class TrialInvitation extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  @Column({ type: DataType.STRING(254), allowNull: false })
  declare email: string;

  @Column({ type: DataType.STRING(16), allowNull: false })
  declare role: TrialRole;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'site_id' })
  declare siteId: number | null;

  @Column({ type: DataType.STRING(1000), allowNull: true })
  declare message: string | null;

  @Column({ type: DataType.CHAR(64), allowNull: false, field: 'token_hash' })
  declare tokenHash: string;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'invited_by' })
  declare invitedBy: number | null;

  @Column({ type: DataType.DATE(3), allowNull: false, field: 'sent_at' })
  declare sentAt: Date;

  @Column({ type: DataType.DATE(3), allowNull: false, field: 'expires_at' })
  declare expiresAt: Date;

  @Column({ type: DataType.DATE(3), allowNull: true, field: 'accepted_at' })
  declare acceptedAt: Date | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'accepted_by' })
  declare acceptedBy: number | null;

  @Column({ type: DataType.DATE(3), allowNull: true, field: 'revoked_at' })
  declare revokedAt: Date | null;

  @BelongsTo(() => Trial)
  declare trial?: Trial;

  @BelongsTo(() => User, 'invitedBy')
  declare inviter?: User;

  declare createdAt: Date;
  declare updatedAt: Date;
}
