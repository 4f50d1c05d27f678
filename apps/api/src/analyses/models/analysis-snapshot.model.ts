import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Trial } from '../../trials/models/trial.model';
import { User } from '../../users/models/user.model';

/** A saved analysis: the choices and full result (JSON text), the hash of the data used and the engine version. */
@Table({ tableName: 'analysis_snapshots' })
export class AnalysisSnapshotRow extends Model {
  @Column({ type: DataType.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true })
  declare id: number;

  @ForeignKey(() => Trial)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: false, field: 'trial_id' })
  declare trialId: number;

  @Column({ type: DataType.STRING(200), allowNull: false })
  declare title: string;

  @Column({ type: DataType.STRING(100), allowNull: false, field: 'measure_name' })
  declare measureName: string;

  @Column({ type: DataType.STRING(100), allowNull: false, field: 'round_label' })
  declare roundLabel: string;

  @Column({ type: DataType.STRING(200), allowNull: false, field: 'scope_label' })
  declare scopeLabel: string;

  @Column({ type: DataType.TEXT, allowNull: false })
  declare choices: string;

  @Column({ type: DataType.CHAR(64), allowNull: false, field: 'data_hash' })
  declare dataHash: string;

  @Column({ type: DataType.STRING(40), allowNull: false, field: 'engine_version' })
  declare engineVersion: string;

  @Column({ type: DataType.TEXT('long'), allowNull: false })
  declare result: string;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'created_by' })
  declare createdById: number | null;

  @BelongsTo(() => User, 'created_by')
  declare creator?: User | null;

  @Column({ type: DataType.DATE(3), allowNull: true, field: 'signed_off_at' })
  declare signedOffAt: Date | null;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER.UNSIGNED, allowNull: true, field: 'signed_off_by' })
  declare signedOffById: number | null;

  @BelongsTo(() => User, 'signed_off_by')
  declare signer?: User | null;

  declare createdAt: Date;
  declare updatedAt: Date;
}
