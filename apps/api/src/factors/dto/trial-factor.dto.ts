import { APPLIED_UNITS, type AppliedUnit, type Factor, type FactorLevel } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';
import { MaterialRateDto, TreatmentDto } from '../../treatments/dto/treatment.dto';

export class TrialFactorLevelDto extends MaterialRateDto implements FactorLevel {
  @ApiProperty()
  id: number;

  @ApiProperty({ description: '1 to 6 letters or digits, unique within the factor; treatment codes join the level codes.' })
  code: string;

  @ApiProperty()
  name: string;

  @ApiProperty({ type: String, nullable: true })
  description: string | null;
}

/** A factor of a factorial trial with its levels (named apart from FactorDto, the request's factor). */
export class TrialFactorDto implements Factor {
  @ApiProperty()
  id: number;

  @ApiProperty({ description: 'Bumped by every save; send it back with each edit: another one answers 409 with the current record.' })
  version: number;

  @ApiProperty({ enum: [1, 2, 3, 4], description: "1 to 4 in the order given; a split plot's whole-plot factor is 1." })
  position: 1 | 2 | 3 | 4;

  @ApiProperty()
  name: string;

  @ApiProperty({ enum: APPLIED_UNITS, enumName: 'AppliedUnit', description: "Where the levels go on: every plot, or a split plot's whole plots, sub plots or sub-sub plots." })
  appliedTo: AppliedUnit;

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
