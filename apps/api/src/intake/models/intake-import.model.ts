import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { AssessmentRoundRow } from '../../rounds/models/assessment-round.model';
import { SiteRow } from '../../sites/models/site.model';
import { Trial } from '../../trials/models/trial.model';
import { User } from '../../users/models/user.model';

export type IntakeImportStage = 'checking' | 'comparing' | 'writing' | 'done' | 'refused' | 'failed';

/** One upload sent to Intake: its stage and counts while it runs, its answer once finished. */
@Table({ tableName: 'intake_imports' })
export class IntakeImportRow extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @Column({ type: DataType.STRING(64), allowNull: false })
  declare ticket: string;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  @ForeignKey(() => SiteRow)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'site_id' })
  declare siteId: number;

  @ForeignKey(() => AssessmentRoundRow)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'round_id' })
  declare roundId: number;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'user_id' })
  declare userId: number | null;

  @BelongsTo(() => User, 'user_id')
  declare user?: User | null;

  @Column({ type: DataType.STRING(255), allowNull: false, field: 'file_name' })
  declare fileName: string;

  @Column({ type: DataType.BIGINT.UNSIGNED, allowNull: false, field: 'size_bytes' })
  declare sizeBytes: number;

  @Column({ type: DataType.STRING(8), allowNull: false })
  declare format: 'csv' | 'xlsx';

  @Column({ type: DataType.BOOLEAN, allowNull: false, field: 'dry_run' })
  declare dryRun: boolean;

  @Column({ type: DataType.STRING(12), allowNull: false })
  declare stage: IntakeImportStage;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0, field: 'rows_checked' })
  declare rowsChecked: number;

  @Column({ type: DataType.BIGINT.UNSIGNED, allowNull: false, defaultValue: 0, field: 'bytes_read' })
  declare bytesRead: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'values_total' })
  declare valuesTotal: number | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0, field: 'values_done' })
  declare valuesDone: number;

  @Column({ type: DataType.STRING(1000), allowNull: true })
  declare message: string | null;

  @Column({ type: DataType.TEXT('medium'), allowNull: true })
  declare outcome: string | null;

  @Column({ type: DataType.DATE(3), allowNull: false, field: 'started_at' })
  declare startedAt: Date;

  @Column({ type: DataType.DATE(3), allowNull: true, field: 'finished_at' })
  declare finishedAt: Date | null;

  declare updatedAt: Date;
}
