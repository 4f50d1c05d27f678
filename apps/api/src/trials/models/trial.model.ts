import { TRIAL_DESIGNS, TRIAL_STATUSES, type TrialDesign, type TrialStatus } from '@friable/contracts';
import { BelongsTo, Column, DataType, ForeignKey, HasMany, Model, Table } from 'sequelize-typescript';
import { User } from '../../users/models/user.model';
import { TrialMembership } from './trial-membership.model';

export { TRIAL_DESIGNS, TRIAL_STATUSES, type TrialDesign, type TrialStatus };

@Table({ tableName: 'trials', version: true })
export class Trial extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  /** Bumped by every save; an edit sent with an older one is refused (see common/protocol/edit-version.ts). */
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 })
  declare version: number;

  @Column({ type: DataType.STRING(20), allowNull: false, unique: true })
  declare code: string;

  @Column({ type: DataType.STRING(200), allowNull: false })
  declare title: string;

  @Column({ type: DataType.STRING(20), allowNull: false, defaultValue: 'rcbd' })
  declare design: TrialDesign;

  @Column({ type: DataType.STRING(12), allowNull: false, defaultValue: 'draft' })
  declare status: TrialStatus;

  @Column({ type: DataType.TEXT, allowNull: true })
  declare question: string | null;

  /** YYYY-MM-DD. */
  @Column({ type: DataType.DATEONLY, allowNull: true, field: 'start_date' })
  declare startDate: string | null;

  /** Text the plot layouts are randomized from (with each site's key). */
  @Column({ type: DataType.STRING(60), allowNull: false, defaultValue: 'friable' })
  declare seed: string;

  @Column({ type: DataType.TEXT, allowNull: true, field: 'safety_notes' })
  declare safetyNotes: string | null;

  @Column({ type: DataType.STRING(500), allowNull: true, field: 'no_control_reason' })
  declare noControlReason: string | null;

  /** The owner: the investigator who created the trial. */
  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'created_by' })
  declare createdBy: number | null;

  @BelongsTo(() => User, 'created_by')
  declare creator?: User;

  @HasMany(() => TrialMembership)
  declare memberships?: TrialMembership[];

  declare createdAt: Date;
  declare updatedAt: Date;
}
