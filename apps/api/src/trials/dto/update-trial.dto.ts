import { ApiPropertyOptional, IntersectionType, OmitType, PartialType } from '@nestjs/swagger';
import { EditVersionDto } from '../../protocol-gate/edit-version';
import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { TRIAL_STATUSES, type TrialStatus } from '../models/trial.model';
import { CreateTrialDto } from './create-trial.dto';

export class UpdateTrialDto extends IntersectionType(PartialType(OmitType(CreateTrialDto, ['code'] as const)), EditVersionDto) {
  @ApiPropertyOptional({ type: String, nullable: true, description: 'Why the trial has no untreated control (instead of one).' })
  @IsOptional()
  @IsString({ message: 'noControlReason must be text' })
  @MaxLength(500, { message: 'noControlReason must be at most 500 characters long' })
  noControlReason?: string | null;

  @ApiPropertyOptional({ enum: TRIAL_STATUSES, description: "'active' only when every activation check passes (422 lists the problems)." })
  @IsOptional()
  @IsIn(TRIAL_STATUSES, { message: `status must be one of ${TRIAL_STATUSES.join(', ')}` })
  status?: TrialStatus;

  @ApiPropertyOptional({
    type: String,
    nullable: true,
    description: 'Why a locked trial is unlocked (status active); required when any of its saved analyses is signed off. Kept in the activity trail.',
  })
  @IsOptional()
  @IsString({ message: 'reason must be text of at most 500 characters' })
  @MaxLength(500, { message: 'reason must be text of at most 500 characters' })
  reason?: string | null;
}
