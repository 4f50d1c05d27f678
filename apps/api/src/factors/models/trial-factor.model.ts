import { Column, DataType, ForeignKey, HasMany, Model, Table } from 'sequelize-typescript';
import { Trial } from '../../trials/models/trial.model';
import { FactorLevel } from './factor-level.model';

@Table({ tableName: 'trial_factors', version: true })
export class TrialFactor extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  /** Bumped by every save; an edit sent with an older one is refused (see common/protocol/edit-version.ts). */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 })
  declare version: number;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  /** 1 to 4; a split plot's whole-plot factor is 1, its sub-plot factor 2, its sub-sub-plot factor 3. */
  @Column({ type: DataType.TINYINT.UNSIGNED, allowNull: false })
  declare position: 1 | 2 | 3 | 4;

  @Column({ type: DataType.STRING(80), allowNull: false })
  declare name: string;

  @HasMany(() => FactorLevel)
  declare levels?: FactorLevel[];
}
