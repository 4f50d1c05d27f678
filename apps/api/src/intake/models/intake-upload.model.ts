import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { AssessmentRoundRow } from '../../rounds/models/assessment-round.model';
import { SiteRow } from '../../sites/models/site.model';
import { Trial } from '../../trials/models/trial.model';
import { User } from '../../users/models/user.model';

/** One committed upload: the file's SHA-256 and what it did. */
@Table({ tableName: 'intake_uploads' })
export class IntakeUploadRow extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

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

  @Column({ type: DataType.CHAR(64), allowNull: false })
  declare sha256: string;

  @Column({ type: DataType.STRING(255), allowNull: false, field: 'file_name' })
  declare fileName: string;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'size_bytes' })
  declare sizeBytes: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'rows_read' })
  declare rowsRead: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'created_count' })
  declare createdCount: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'updated_count' })
  declare updatedCount: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'unchanged_count' })
  declare unchangedCount: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0, field: 'warnings_accepted' })
  declare warningsAccepted: number;

  declare createdAt: Date;
}
