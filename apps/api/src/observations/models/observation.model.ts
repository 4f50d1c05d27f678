import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { MeasureRow } from '../../measures/models/measure.model';
import { PlotRow } from '../../plots/models/plot.model';
import { AssessmentRoundRow } from '../../rounds/models/assessment-round.model';
import { Trial } from '../../trials/models/trial.model';
import { User } from '../../users/models/user.model';

export type ObservationSource = 'upload' | 'edit';

/** One value of a plot, round and measure. `valueText` is what was typed; `valueDecimal` (text from MariaDB) the same number. */
@Table({ tableName: 'observations' })
export class ObservationRow extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  @ForeignKey(() => PlotRow)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'plot_id' })
  declare plotId: number;

  @ForeignKey(() => AssessmentRoundRow)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'round_id' })
  declare roundId: number;

  @ForeignKey(() => MeasureRow)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'measure_id' })
  declare measureId: number;

  @Column({ type: DataType.STRING(40), allowNull: true, field: 'value_text' })
  declare valueText: string | null;

  @Column({ type: DataType.DECIMAL(30, 10), allowNull: true, field: 'value_decimal' })
  declare valueDecimal: string | null;

  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: false })
  declare censored: boolean;

  @Column({ type: DataType.STRING(200), allowNull: true, field: 'missing_reason' })
  declare missingReason: string | null;

  @Column({ type: DataType.TEXT, allowNull: true })
  declare notes: string | null;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 })
  declare version: number;

  @Column({ type: DataType.STRING(10), allowNull: false })
  declare source: ObservationSource;

  /** The upload that last wrote this value; null after an edit in the Ledger. */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'upload_id' })
  declare uploadId: number | null;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'recorded_by' })
  declare recordedBy: number | null;

  @Column({ type: DataType.DATE(3), allowNull: false, field: 'recorded_at' })
  declare recordedAt: Date;

  @BelongsTo(() => User, 'recorded_by')
  declare recorder?: User;
}
