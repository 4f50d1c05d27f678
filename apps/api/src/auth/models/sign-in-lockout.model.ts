import { Column, DataType, Model, Table } from 'sequelize-typescript';

/** Failed sign-ins of one subject: `account:<e-mail>` or `address:<client address>`. */
@Table({ tableName: 'sign_in_lockouts', timestamps: false })
export class SignInLockout extends Model {
  @Column({ type: DataType.STRING(300), primaryKey: true })
  declare subject: string;

  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 })
  declare failures: number;

  @Column({ type: DataType.DATE(3), allowNull: true, field: 'last_failure_at' })
  declare lastFailureAt: Date | null;

  @Column({ type: DataType.DATE(3), allowNull: true, field: 'locked_until' })
  declare lockedUntil: Date | null;
}
