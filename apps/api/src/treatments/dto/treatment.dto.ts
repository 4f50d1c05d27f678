import { RATE_BASES, RATE_UNIT_IDS, type MaterialRate, type RateBasis, type RateUnitId, type Treatment } from '@friable/contracts';
import { ApiProperty } from '@nestjs/swagger';

/** The stated rate of what is applied and its material: a treatment's, or a factor level's. */
export class MaterialRateDto implements MaterialRate {
  @ApiProperty({ type: Number, nullable: true, description: 'null for an untreated control or a treatment without an applied material.' })
  rateValue: number | null;

  @ApiProperty({ enum: RATE_UNIT_IDS, enumName: 'RateUnitId', nullable: true })
  rateUnit: RateUnitId | null;

  @ApiProperty({ enum: RATE_BASES, enumName: 'RateBasis' })
  rateBasis: RateBasis;

  @ApiProperty({ type: Number, nullable: true, description: "Needed when rateBasis is 'concentration'." })
  incorporationDepthCm: number | null;

  @ApiProperty({ type: String, nullable: true })
  product: string | null;

  @ApiProperty({ type: Number, nullable: true, description: 'Share of active material in the product, (0, 1]; null = the rate is for the product as sold.' })
  purity: number | null;

  @ApiProperty({ enum: ['as-is', 'dry'] })
  moistureBasis: 'as-is' | 'dry';

  @ApiProperty({ type: Number, nullable: true, description: 'Water share of the as-is product for a dry-basis rate, [0, 1).' })
  moistureFraction: number | null;

  @ApiProperty({ enum: ['gypsum', 'other'] })
  materialKind: 'gypsum' | 'other';
}

export class TreatmentDto extends MaterialRateDto implements Treatment {
  @ApiProperty()
  id: number;

  @ApiProperty({ description: 'Bumped by every save; send it back with each edit: another one answers 409 with the current record.' })
  version: number;

  @ApiProperty()
  code: string;

  @ApiProperty()
  name: string;

  @ApiProperty({ type: String, nullable: true })
  description: string | null;

  @ApiProperty()
  isControl: boolean;

  @ApiProperty({ type: [Number], description: 'Factorial and split-plot trials: the level of each factor, in the factors\' order.' })
  factorLevelIds: number[];

  @ApiProperty()
  position: number;
}
