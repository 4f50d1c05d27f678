import type { PowerAnswer } from '@friable/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

export class PowerAnswerDto implements PowerAnswer {
  @ApiProperty({ description: 'Blocks per site: as given, or the fewest reaching targetPower.' })
  blocks: number;

  @ApiProperty({ description: 'Power of the treatment F test with that many blocks.' })
  power: number;

  @ApiPropertyOptional({ description: 'With blocks given: the noncentrality of the F distribution.' })
  noncentrality?: number;

  @ApiPropertyOptional({ description: 'With blocks given: numerator degrees of freedom.' })
  df1?: number;

  @ApiPropertyOptional({ description: 'With blocks given: denominator degrees of freedom.' })
  df2?: number;
}
