import type { RateBasis, RateUnitId } from '@friable/contracts';
import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { FactorLevel } from '../../factors/models/factor-level.model';
import { Trial } from '../../trials/models/trial.model';

/** DECIMAL columns come back from MariaDB as strings; the presenter turns them into numbers. */
@Table({ tableName: 'treatments', version: true, paranoid: true })
export class TreatmentRow extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  /** Bumped by every save; an edit sent with an older one is refused (see common/protocol/edit-version.ts). */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 })
  declare version: number;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  @Column({ type: DataType.STRING(24), allowNull: false })
  declare code: string;

  @Column({ type: DataType.STRING(120), allowNull: false })
  declare name: string;

  @Column({ type: DataType.TEXT, allowNull: true })
  declare description: string | null;

  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: false, field: 'is_control' })
  declare isControl: boolean;

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

  @ForeignKey(() => FactorLevel)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'factor_level_a_id' })
  declare factorLevelAId: number | null;

  @ForeignKey(() => FactorLevel)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'factor_level_b_id' })
  declare factorLevelBId: number | null;

  @ForeignKey(() => FactorLevel)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'factor_level_c_id' })
  declare factorLevelCId: number | null;

  @ForeignKey(() => FactorLevel)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'factor_level_d_id' })
  declare factorLevelDId: number | null;

  @Column({ type: DataType.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 0 })
  declare position: number;
}
