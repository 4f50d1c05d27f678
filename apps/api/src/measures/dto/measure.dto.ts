import { MEASURE_KINDS, type Measure, type MeasureKind } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

export class MeasureDto implements Measure {
  @ApiProperty()
  id: number;

  @ApiProperty({ description: 'Bumped by every save; send it back with each edit: another one answers 409 with the current record.' })
  version: number;

  @ApiProperty()
  code: string;

  @ApiProperty()
  name: string;

  @ApiProperty({ description: "An id from @friable/field's MEASURE_UNITS." })
  unit: string;

  @ApiProperty({ enum: MEASURE_KINDS, enumName: 'MeasureKind' })
  kind: MeasureKind;

  @ApiProperty({ type: Number, nullable: true, description: "Lowest score (kind 'score')." })
  scaleMin: number | null;

  @ApiProperty({ type: Number, nullable: true, description: "Highest score (kind 'score')." })
  scaleMax: number | null;

  @ApiProperty({ type: Number, nullable: true, description: "Cut-off in the measure's unit (kind 'time-with-cutoff')." })
  cutoff: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Below it a value is accepted with a warning.' })
  plausibleMin: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Above it a value is accepted with a warning.' })
  plausibleMax: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Below it a value is refused.' })
  hardMin: number | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Above it a value is refused.' })
  hardMax: number | null;

  @ApiProperty()
  decimals: number;

  @ApiProperty()
  higherIsBetter: boolean;

  @ApiProperty()
  position: number;
}
