import { BelongsTo, Column, DataType, ForeignKey, HasMany, Model, Table } from 'sequelize-typescript';
import { Trial } from '../../trials/models/trial.model';
import { User } from '../../users/models/user.model';
import { AnalysisSnapshotRow } from './analysis-snapshot.model';
import { SnapshotCommentRevisionRow } from './snapshot-comment-revision.model';

/** A comment on a saved analysis: a thread's opening or a reply, edited, deleted (text emptied, kept in its revisions) or resolved. */
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

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'parent_id' })
  declare parentId: number | null;

  @Column({ type: DataType.DATE(3), allowNull: true, field: 'edited_at' })
  declare editedAt: Date | null;

  @Column({ type: DataType.DATE(3), allowNull: true, field: 'deleted_at' })
  declare deletedAt: Date | null;

  @Column({ type: DataType.DATE(3), allowNull: true, field: 'resolved_at' })
  declare resolvedAt: Date | null;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'resolved_by' })
  declare resolvedById: number | null;

  @BelongsTo(() => User, 'resolved_by')
  declare resolver?: User | null;

  /** Bumped by each edit, resolution, reopening and the deletion; a change sent with another version is refused. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 })
  declare version: number;

  @HasMany(() => SnapshotCommentRevisionRow, 'comment_id')
  declare revisions?: SnapshotCommentRevisionRow[];

  declare createdAt: Date;
  declare updatedAt: Date;
}
