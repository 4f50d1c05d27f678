import type { MeasureKind } from '@friable/contracts';
import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Trial } from '../../trials/models/trial.model';

const limit = (field: string) => ({ type: DataType.DECIMAL(18, 6), allowNull: true, field });

/** DECIMAL columns come back from MariaDB as strings; the presenter turns them into numbers. */
@Table({ tableName: 'measures', version: true, paranoid: true })
export class MeasureRow extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  /** Bumped by every save; an edit sent with an older one is refused (see common/protocol/edit-version.ts). */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 })
  declare version: number;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  @Column({ type: DataType.STRING(12), allowNull: false })
  declare code: string;

  @Column({ type: DataType.STRING(80), allowNull: false })
  declare name: string;

  @Column({ type: DataType.STRING(16), allowNull: false })
  declare unit: string;

  @Column({ type: DataType.STRING(20), allowNull: false })
  declare kind: MeasureKind;

  @Column(limit('scale_min')) declare scaleMin: string | number | null;
  @Column(limit('scale_max')) declare scaleMax: string | number | null;
  @Column(limit('cutoff')) declare cutoff: string | number | null;
  @Column(limit('plausible_min')) declare plausibleMin: string | number | null;
  @Column(limit('plausible_max')) declare plausibleMax: string | number | null;
  @Column(limit('hard_min')) declare hardMin: string | number | null;
  @Column(limit('hard_max')) declare hardMax: string | number | null;

  @Column({ type: DataType.TINYINT.UNSIGNED, allowNull: false, defaultValue: 1 })
  declare decimals: number;

  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: true, field: 'higher_is_better' })
  declare higherIsBetter: boolean;

  @Column({ type: DataType.SMALLINT.UNSIGNED, allowNull: false, defaultValue: 0 })
  declare position: number;
}
