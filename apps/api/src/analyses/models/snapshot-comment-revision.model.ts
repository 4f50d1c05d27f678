import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { User } from '../../users/models/user.model';
import { SnapshotCommentRow } from './snapshot-comment.model';

/** A comment's text before an edit or a deletion. */
@Table({ tableName: 'snapshot_comment_revisions', updatedAt: false })
export class SnapshotCommentRevisionRow extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @ForeignKey(() => SnapshotCommentRow)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'comment_id' })
  declare commentId: number;

  @Column({ type: DataType.STRING(10), allowNull: false })
  declare kind: 'edited' | 'deleted';

  @Column({ type: DataType.TEXT, allowNull: false })
  declare body: string;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'changed_by' })
  declare changedById: number | null;

  @BelongsTo(() => User, 'changed_by')
  declare changer?: User | null;

  declare createdAt: Date;
}
