import { AfterBulkDestroy, AfterBulkUpdate, AfterDestroy, AfterUpdate, Column, DataType, Model, Table } from 'sequelize-typescript';
import { accessStampHook } from '../../data-stamps/access-stamp-hook';

@Table({ tableName: 'users' })
export class User extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @Column({ type: DataType.STRING(254), allowNull: false, unique: true })
  declare email: string;

  @Column({ type: DataType.STRING(120), allowNull: false })
  declare name: string;

  @Column({ type: DataType.STRING(100), allowNull: false, field: 'password_hash' })
  declare passwordHash: string;

  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: false, field: 'is_admin' })
  declare isAdmin: boolean;

  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: true, field: 'is_active' })
  declare isActive: boolean;

  /** BCP 47 tag for numbers and dates (e.g. `de-DE`); null uses the browser's own. */
  @Column({ type: DataType.STRING(20), allowNull: true })
  declare locale: string | null;

  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: true, field: 'email_reminders' })
  declare emailReminders: boolean;

  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: true, field: 'email_receipts' })
  declare emailReceipts: boolean;

  @Column({ type: DataType.DATE(3), allowNull: true, field: 'last_sign_in_at' })
  declare lastSignInAt: Date | null;

  @Column({ type: DataType.DATE(3), allowNull: true, field: 'password_changed_at' })
  declare passwordChangedAt: Date | null;

  declare createdAt: Date;
  declare updatedAt: Date;

  /**
   * A change of what a signed-in person is (active, administrator, name, e-mail) or the account's removal moves
   * the access stamp: instances drop the sessions they keep in memory (auth/sessions.service.ts).
   */
  @AfterUpdate
  @AfterBulkUpdate
  @AfterDestroy
  @AfterBulkDestroy
  static readonly accessChanged = accessStampHook(['isActive', 'isAdmin', 'name', 'email']);
}
