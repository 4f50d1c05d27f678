import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Trial } from '../../trials/models/trial.model';
import { User } from '../../users/models/user.model';

/** One line of a trial's activity log. `details` is JSON text (MariaDB's JSON is LONGTEXT anyway). */
@Table({ tableName: 'activity_entries' })
export class ActivityEntryRow extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'user_id' })
  declare userId: number | null;

  @Column({ type: DataType.STRING(40), allowNull: false })
  declare kind: string;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'site_id' })
  declare siteId: number | null;

  @Column({ type: DataType.STRING(500), allowNull: false })
  declare summary: string;

  @Column({ type: DataType.TEXT, allowNull: false })
  declare details: string;

  @BelongsTo(() => User)
  declare user?: User;

  declare createdAt: Date;
  declare updatedAt: Date;
}
