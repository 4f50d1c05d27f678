import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { User } from '../../users/models/user.model';
import { Trial } from './trial.model';

/** A person removed from a trial: their old session gets 403 "removed" instead of 404, and the trail says when. */
@Table({ tableName: 'trial_departures', updatedAt: false })
export class TrialDeparture extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'user_id' })
  declare userId: number;

  /** The roles held when removed, comma-separated. */
  @Column({ type: DataType.STRING(200), allowNull: false })
  declare roles: string;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'removed_by' })
  declare removedById: number | null;

  declare createdAt: Date;
}
