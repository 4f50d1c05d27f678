import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Trial } from '../../trials/models/trial.model';
import { User } from '../../users/models/user.model';
import { AnalysisSnapshotRow } from './analysis-snapshot.model';

/** A comment on a saved analysis. */
@Table({ tableName: 'snapshot_comments' })
export class SnapshotCommentRow extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  @ForeignKey(() => AnalysisSnapshotRow)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'snapshot_id' })
  declare snapshotId: number;

  @Column({ type: DataType.TEXT, allowNull: false })
  declare body: string;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'author_id' })
  declare authorId: number | null;

  @BelongsTo(() => User, 'author_id')
  declare author?: User | null;

  declare createdAt: Date;
  declare updatedAt: Date;
}
