import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Trial } from '../../trials/models/trial.model';
import { User } from '../../users/models/user.model';
import type { ObservationSource } from './observation.model';
import { ObservationRow } from './observation.model';

/** One entry of a value's audit trail (`hadBefore` false for its first save). */
@Table({ tableName: 'observation_changes', timestamps: false })
export class ObservationChangeRow extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @ForeignKey(() => ObservationRow)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'observation_id' })
  declare observationId: number;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  @Column({ type: DataType.DATE(3), allowNull: false })
  declare at: Date;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'user_id' })
  declare userId: number | null;

  @BelongsTo(() => User, 'user_id')
  declare user?: User;

  @Column({ type: DataType.STRING(10), allowNull: false })
  declare source: ObservationSource;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'upload_id' })
  declare uploadId: number | null;

  @Column({ type: DataType.BOOLEAN, allowNull: false, field: 'had_before' })
  declare hadBefore: boolean;

  @Column({ type: DataType.STRING(40), allowNull: true, field: 'before_text' })
  declare beforeText: string | null;

  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: false, field: 'before_censored' })
  declare beforeCensored: boolean;

  @Column({ type: DataType.STRING(200), allowNull: true, field: 'before_missing_reason' })
  declare beforeMissingReason: string | null;

  @Column({ type: DataType.STRING(40), allowNull: true, field: 'after_text' })
  declare afterText: string | null;

  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: false, field: 'after_censored' })
  declare afterCensored: boolean;

  @Column({ type: DataType.STRING(200), allowNull: true, field: 'after_missing_reason' })
  declare afterMissingReason: string | null;
}
