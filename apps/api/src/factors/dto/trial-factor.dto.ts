import type { Factor } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { TreatmentDto } from '../../treatments/dto/treatment.dto';

export class TrialFactorLevelDto {
  @ApiProperty()
  id: number;

  @ApiProperty()
  code: string;

  @ApiProperty()
  name: string;
}

/** A factor of a factorial trial with its levels (named apart from FactorDto, the request's factor). */
export class TrialFactorDto implements Factor {
  @ApiProperty()
  id: number;

  @ApiProperty({ enum: [1, 2], description: '1 = factor A, 2 = factor B.' })
  position: 1 | 2;

  @ApiProperty()
  name: string;

  @ApiProperty({ type: [TrialFactorLevelDto] })
  levels: TrialFactorLevelDto[];
}

/** PUT …/factors: the new factors and the treatments made from every combination of their levels. */
export class FactorsReplacedDto {
  @ApiProperty({ type: [TrialFactorDto] })
  factors: TrialFactorDto[];

  @ApiProperty({ type: [TreatmentDto] })
  treatments: TreatmentDto[];
}
