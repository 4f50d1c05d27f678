import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { SiteRow } from '../../sites/models/site.model';
import { TreatmentRow } from '../../treatments/models/treatment.model';
import { Trial } from '../../trials/models/trial.model';

@Table({ tableName: 'plots' })
export class PlotRow extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  @ForeignKey(() => SiteRow)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'site_id' })
  declare siteId: number;

  @Column({ type: DataType.SMALLINT.UNSIGNED, allowNull: false })
  declare block: number;

  @Column({ type: DataType.SMALLINT.UNSIGNED, allowNull: false })
  declare position: number;

  /** Split designs: the whole plot within the block, from 1; null otherwise. */
  @Column({ type: DataType.SMALLINT.UNSIGNED, allowNull: true, field: 'whole_plot' })
  declare wholePlot: number | null;

  /** Split designs: the sub plot within the whole plot, from 1; null otherwise. */
  @Column({ type: DataType.SMALLINT.UNSIGNED, allowNull: true, field: 'sub_plot' })
  declare subPlot: number | null;

  /** Split-split plot: the sub-sub plot within the sub plot, from 1; null otherwise. */
  @Column({ type: DataType.SMALLINT.UNSIGNED, allowNull: true, field: 'sub_sub_plot' })
  declare subSubPlot: number | null;

  @ForeignKey(() => TreatmentRow)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'treatment_id' })
  declare treatmentId: number;

  @Column({ type: DataType.STRING(32), allowNull: false })
  declare label: string;

  @BelongsTo(() => SiteRow)
  declare site?: SiteRow;

  @BelongsTo(() => TreatmentRow)
  declare treatment?: TreatmentRow;
}
