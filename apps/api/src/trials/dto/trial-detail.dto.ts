import { TRIAL_DESIGNS, TRIAL_ROLES, TRIAL_STATUSES, type ActivationCheck, type TrialDesign, type TrialDetail, type TrialRole, type TrialStatus } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { TrialFactorDto } from '../../factors/dto/trial-factor.dto';
import { MeasureDto } from '../../measures/dto/measure.dto';
import { AssessmentRoundDto } from '../../rounds/dto/assessment-round.dto';
import { SiteDto } from '../../sites/dto/site.dto';
import { TreatmentDto } from '../../treatments/dto/treatment.dto';

export class ActivationCheckDto implements ActivationCheck {
  @ApiProperty()
  ready: boolean;

  @ApiProperty({ type: [String], description: 'Each failed check in words, e.g. "Site Millbrook is not randomized yet."' })
  problems: string[];

  @ApiProperty({ type: [String], description: "What does not stop the trial but should be read before it starts (the design's guardrails per site)." })
  warnings: string[];
}

/** The protocol fields of a trial, without what depends on the caller (also the report's protocol). */
export class TrialProtocolDto implements Omit<TrialDetail, 'myRoles' | 'mySiteIds' | 'activation'> {
  @ApiProperty()
  id: number;

  @ApiProperty({ description: 'Bumped by every save; send it back with each edit: another one answers 409 with the current record.' })
  version: number;

  @ApiProperty()
  code: string;

  @ApiProperty()
  title: string;

  @ApiProperty({ type: String, nullable: true })
  question: string | null;

  @ApiProperty({ enum: TRIAL_DESIGNS, enumName: 'TrialDesign' })
  design: TrialDesign;

  @ApiProperty({ enum: TRIAL_STATUSES, enumName: 'TrialStatus' })
  status: TrialStatus;

  @ApiProperty({ type: String, format: 'date', nullable: true })
  startDate: string | null;

  @ApiProperty()
  seed: string;

  @ApiProperty({ type: String, nullable: true })
  safetyNotes: string | null;

  @ApiProperty({ type: String, nullable: true })
  noControlReason: string | null;

  @ApiProperty({ type: Number, nullable: true })
  ownerId: number | null;

  @ApiProperty({ format: 'date-time' })
  updatedAt: string;

  @ApiProperty({ type: [TrialFactorDto] })
  factors: TrialFactorDto[];

  @ApiProperty({ type: [TreatmentDto] })
  treatments: TreatmentDto[];

  @ApiProperty({ type: [MeasureDto] })
  measures: MeasureDto[];

  @ApiProperty({ type: [AssessmentRoundDto] })
  rounds: AssessmentRoundDto[];

  @ApiProperty({ type: [SiteDto] })
  sites: SiteDto[];
}

/** GET /api/trials/:trialId: the whole protocol, the caller's roles and the activation checks. */
export class TrialDetailDto extends TrialProtocolDto implements TrialDetail {
  @ApiProperty({ enum: TRIAL_ROLES, enumName: 'TrialRole', isArray: true })
  myRoles: TrialRole[];

  @ApiProperty({ type: [Number], description: 'Sites a collaborator caller is assigned to.' })
  mySiteIds: number[];

  @ApiProperty({ type: ActivationCheckDto })
  activation: ActivationCheckDto;
}
