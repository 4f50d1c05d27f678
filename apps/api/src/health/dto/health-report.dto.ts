import type { HealthReport } from '@friable/contracts';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';

export class HealthReportDto implements HealthReport {
  @ApiProperty({ enum: ['ok', 'unavailable'] })
  status: 'ok' | 'unavailable';

  @ApiProperty({ enum: ['up', 'down'] })
  database: 'up' | 'down';

  @ApiPropertyOptional({ description: 'What is down, in words.' })
  message?: string;
}
