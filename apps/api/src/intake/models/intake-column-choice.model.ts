import { Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Trial } from '../../trials/models/trial.model';
import { User } from '../../users/models/user.model';

/** What a trial's uploads read one of their column headers as, where the person chose it. */
@Table({ tableName: 'intake_column_choices' })
export class IntakeColumnChoiceRow extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  @Column({ type: DataType.STRING(255), allowNull: false })
  declare header: string;

  /** A role (plotLabel, block, …), a measure code, or null: "not read". */
  @Column({ type: DataType.STRING(40), allowNull: true })
  declare choice: string | null;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'updated_by' })
  declare updatedBy: number | null;

  declare updatedAt: Date;
}
