import type { ObservationEdit } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsInt, Min } from 'class-validator';
import { ObservationValueFields } from './observation-value-fields';

/** PATCH /observations/:observationId — the version the editor saw, and the new value. */
export class EditObservationDto extends ObservationValueFields implements ObservationEdit {
  @ApiProperty({ example: 1, description: 'The version the editor saw; a stale one answers 409 with the current value.' })
  @IsInt({ message: 'version must be a whole number' })
  @Min(1, { message: 'version must be a whole number, 1 or more' })
  version!: number;
}
