import { Column, DataType, Model, Table } from 'sequelize-typescript';

/** A reminder e-mailed to one collaborator for one round due on one date at one site. */
@Table({ tableName: 'round_reminders' })
export class RoundReminder extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'round_id' })
  declare roundId: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'site_id' })
  declare siteId: number;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'user_id' })
  declare userId: number;

  @Column({ type: DataType.DATEONLY, allowNull: false, field: 'due_date' })
  declare dueDate: string;

  @Column({ type: DataType.DATE(3), allowNull: false, field: 'sent_at' })
  declare sentAt: Date;
}
