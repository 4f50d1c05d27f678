import type { ObservationCreate } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { IsInt, Min } from 'class-validator';
import { ObservationValueFields } from './observation-value-fields';

/** POST /observations — a value for a plot, round and measure that has none yet. */
export class CreateObservationDto extends ObservationValueFields implements ObservationCreate {
  @ApiProperty()
  @IsInt({ message: 'plotId must be a whole number' })
  @Min(1, { message: 'plotId must be a whole number' })
  plotId!: number;

  @ApiProperty()
  @IsInt({ message: 'roundId must be a whole number' })
  @Min(1, { message: 'roundId must be a whole number' })
  roundId!: number;

  @ApiProperty()
  @IsInt({ message: 'measureId must be a whole number' })
  @Min(1, { message: 'measureId must be a whole number' })
  measureId!: number;
}
