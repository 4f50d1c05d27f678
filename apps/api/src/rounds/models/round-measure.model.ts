import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { MeasureRow } from '../../measures/models/measure.model';
import { AssessmentRoundRow } from './assessment-round.model';

@Table({ tableName: 'round_measures', timestamps: false })
export class RoundMeasure extends Model {
  @ForeignKey(() => AssessmentRoundRow)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, primaryKey: true, field: 'round_id' })
  declare roundId: number;

  @ForeignKey(() => MeasureRow)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, primaryKey: true, field: 'measure_id' })
  declare measureId: number;
}
