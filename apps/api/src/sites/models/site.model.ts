import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Trial } from '../../trials/models/trial.model';
import { User } from '../../users/models/user.model';

const size = (field: string) => ({ type: DataType.DECIMAL(10, 3), allowNull: true, field });

/** DECIMAL columns come back from MariaDB as strings; the presenter turns them into numbers. */
@Table({ tableName: 'sites', version: true, paranoid: true })
export class SiteRow extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  /** Bumped by every save; an edit sent with an older one is refused (see common/protocol/edit-version.ts). */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 })
  declare version: number;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  @Column({ type: DataType.STRING(120), allowNull: false })
  declare name: string;

  @Column({ type: DataType.STRING(300), allowNull: true })
  declare location: string | null;

  @Column({ type: DataType.TEXT, allowNull: true, field: 'soil_description' })
  declare soilDescription: string | null;

  @Column({ type: DataType.STRING(10), allowNull: false })
  declare shape: 'rectangle' | 'round';

  @Column(size('length_m')) declare lengthM: string | number | null;
  @Column(size('width_m')) declare widthM: string | number | null;
  @Column(size('diameter_cm')) declare diameterCm: string | number | null;
  @Column(size('container_depth_cm')) declare containerDepthCm: string | number | null;
  @Column(size('soil_volume_l')) declare soilVolumeL: string | number | null;

  @Column({ type: DataType.SMALLINT.UNSIGNED, allowNull: false })
  declare blocks: number;

  @Column({ type: DataType.STRING(3), allowNull: false, field: 'label_prefix' })
  declare labelPrefix: string;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'lead_user_id' })
  declare leadUserId: number | null;

  @BelongsTo(() => User, 'lead_user_id')
  declare lead?: User;

  @Column({ type: DataType.DATE, allowNull: true, field: 'randomized_at' })
  declare randomizedAt: Date | null;

  @Column({ type: DataType.STRING(60), allowNull: true, field: 'randomization_seed' })
  declare randomizationSeed: string | null;
}
