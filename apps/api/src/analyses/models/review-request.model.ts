import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Trial } from '../../trials/models/trial.model';
import { User } from '../../users/models/user.model';
import { AnalysisSnapshotRow } from './analysis-snapshot.model';

/** The investigator's request for review of a saved analysis (e-mailed to the trial's reviewers). */
@Table({ tableName: 'review_requests', updatedAt: false })
export class ReviewRequestRow extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  @ForeignKey(() => AnalysisSnapshotRow)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'snapshot_id' })
  declare snapshotId: number;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'requested_by' })
  declare requestedById: number | null;

  @Column({ type: DataType.STRING(2000), allowNull: true })
  declare message: string | null;

  declare createdAt: Date;
}
