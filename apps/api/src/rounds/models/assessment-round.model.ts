import { BelongsToMany, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { MeasureRow } from '../../measures/models/measure.model';
import { Trial } from '../../trials/models/trial.model';
import { RoundMeasure } from './round-measure.model';

@Table({ tableName: 'assessment_rounds', version: true, paranoid: true })
export class AssessmentRoundRow extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  /** Bumped by every save; an edit sent with an older one is refused (see common/protocol/edit-version.ts). */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 })
  declare version: number;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  @Column({ type: DataType.STRING(60), allowNull: false })
  declare label: string;

  /** Days after the trial's start date. */
  @Column({ type: DataType.SMALLINT, allowNull: false, field: 'day_offset' })
  declare dayOffset: number;

  @BelongsToMany(() => MeasureRow, () => RoundMeasure)
  declare measures?: MeasureRow[];
}
