import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { TrialFactor } from './trial-factor.model';

@Table({ tableName: 'factor_levels' })
export class FactorLevel extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @ForeignKey(() => TrialFactor)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'factor_id' })
  declare factorId: number;

  @Column({ type: DataType.STRING(6), allowNull: false })
  declare code: string;

  @Column({ type: DataType.STRING(80), allowNull: false })
  declare name: string;

  @Column({ type: DataType.SMALLINT.UNSIGNED, allowNull: false })
  declare position: number;
}
