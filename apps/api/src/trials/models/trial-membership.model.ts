import { TRIAL_ROLES, type TrialRole } from '@friable/contracts';
import { AfterBulkCreate, AfterBulkDestroy, AfterBulkUpdate, AfterCreate, AfterDestroy, AfterUpdate, BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { accessStampHook } from '../../data-stamps/access-stamp-hook';
import { User } from '../../users/models/user.model';
import { Trial } from './trial.model';

export { TRIAL_ROLES, type TrialRole };

@Table({ tableName: 'trial_memberships' })
export class TrialMembership extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'user_id' })
  declare userId: number;

  @Column({ type: DataType.STRING(16), allowNull: false })
  declare role: TrialRole;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'site_id' })
  declare siteId: number | null;

  @BelongsTo(() => Trial)
  declare trial?: Trial;

  @BelongsTo(() => User)
  declare user?: User;

  /** Any change of a membership moves the access stamp: instances drop the trial roles they keep in memory. */
  @AfterCreate
  @AfterBulkCreate
  @AfterUpdate
  @AfterBulkUpdate
  @AfterDestroy
  @AfterBulkDestroy
  static readonly accessChanged = accessStampHook();
}
