import type { RateBasis, RateUnitId } from '@friable/contracts';
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

  @Column({ type: DataType.TEXT, allowNull: true })
  declare description: string | null;

  // The level's rate and material, as a treatment's (DECIMAL columns come back as strings).
  @Column({ type: DataType.DECIMAL(14, 4), allowNull: true, field: 'rate_value' })
  declare rateValue: string | number | null;

  @Column({ type: DataType.STRING(16), allowNull: true, field: 'rate_unit' })
  declare rateUnit: RateUnitId | null;

  @Column({ type: DataType.STRING(16), allowNull: false, defaultValue: 'area', field: 'rate_basis' })
  declare rateBasis: RateBasis;

  @Column({ type: DataType.DECIMAL(8, 2), allowNull: true, field: 'incorporation_depth_cm' })
  declare incorporationDepthCm: string | number | null;

  @Column({ type: DataType.STRING(200), allowNull: true })
  declare product: string | null;

  @Column({ type: DataType.DECIMAL(7, 6), allowNull: true })
  declare purity: string | number | null;

  @Column({ type: DataType.STRING(8), allowNull: false, defaultValue: 'as-is', field: 'moisture_basis' })
  declare moistureBasis: 'as-is' | 'dry';

  @Column({ type: DataType.DECIMAL(7, 6), allowNull: true, field: 'moisture_fraction' })
  declare moistureFraction: string | number | null;

  @Column({ type: DataType.STRING(12), allowNull: false, defaultValue: 'other', field: 'material_kind' })
  declare materialKind: 'gypsum' | 'other';
}
