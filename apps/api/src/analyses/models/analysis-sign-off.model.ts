import type { TrialRole } from '@friable/contracts';
import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Trial } from '../../trials/models/trial.model';
import { User } from '../../users/models/user.model';
import { AnalysisSnapshotRow } from './analysis-snapshot.model';

/**
 * One person's sign-off of a saved analysis: name and role at the time, statement, and the data hash and engine version
 * signed. Its author may amend the statement or withdraw it (kept, with the reason); `version` guards both.
 */
@Table({ tableName: 'analysis_sign_offs', updatedAt: false })
export class AnalysisSignOffRow extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  @ForeignKey(() => AnalysisSnapshotRow)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'snapshot_id' })
  declare snapshotId: number;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'user_id' })
  declare userId: number | null;

  @Column({ type: DataType.STRING(120), allowNull: false, field: 'signer_name' })
  declare signerName: string;

  @Column({ type: DataType.STRING(16), allowNull: false })
  declare role: TrialRole;

  @Column({ type: DataType.STRING(1000), allowNull: false })
  declare statement: string;

  @Column({ type: DataType.CHAR(64), allowNull: false, field: 'data_hash' })
  declare dataHash: string;

  @Column({ type: DataType.STRING(40), allowNull: false, field: 'engine_version' })
  declare engineVersion: string;

  /** Bumped by each amendment and by the withdrawal; an edit sent with another version is refused. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 })
  declare version: number;

  @Column({ type: DataType.DATE(3), allowNull: true, field: 'amended_at' })
  declare amendedAt: Date | null;

  @Column({ type: DataType.DATE(3), allowNull: true, field: 'withdrawn_at' })
  declare withdrawnAt: Date | null;

  @Column({ type: DataType.STRING(1000), allowNull: true, field: 'withdrawal_reason' })
  declare withdrawalReason: string | null;

  declare createdAt: Date;
}
