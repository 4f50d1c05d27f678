import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { PlotRow } from '../../plots/models/plot.model';
import { AssessmentRoundRow } from '../../rounds/models/assessment-round.model';
import { Trial } from '../../trials/models/trial.model';
import { User } from '../../users/models/user.model';

/** The photo of a plot in a round; its bytes are in the storage service under `storageKey`. */
@Table({ tableName: 'plot_photos' })
export class PlotPhotoRow extends Model {
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

  @Column({ type: DataType.STRING(200), allowNull: false, field: 'storage_key' })
  declare storageKey: string;

  @Column({ type: DataType.STRING(40), allowNull: false, field: 'content_type' })
  declare contentType: string;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'size_bytes' })
  declare sizeBytes: number;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'uploaded_by' })
  declare uploadedBy: number | null;

  declare createdAt: Date;
  declare updatedAt: Date;
}
