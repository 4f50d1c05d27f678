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

  @ForeignKey(() => TreatmentRow)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'treatment_id' })
  declare treatmentId: number;

  @Column({ type: DataType.STRING(20), allowNull: false })
  declare label: string;

  @BelongsTo(() => SiteRow)
  declare site?: SiteRow;

  @BelongsTo(() => TreatmentRow)
  declare treatment?: TreatmentRow;
}
