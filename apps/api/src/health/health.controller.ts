import { Controller, Get, Res } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import { ApiOkResponse, ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { Public } from '../common/decorators/access.decorator';
import { HealthReportDto } from './dto/health-report.dto';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(@InjectConnection() private readonly sequelize: Sequelize) {}

  @Get()
  @Public()
  @ApiOkResponse({ type: HealthReportDto, description: '{"status":"ok","database":"up"}' })
  @ApiServiceUnavailableResponse({ type: HealthReportDto, description: 'Names what is down.' })
  async check(@Res({ passthrough: true }) response: Response) {
    try {
      await Promise.race([
        this.sequelize.query('SELECT 1 AS ok', { type: QueryTypes.SELECT }),
        new Promise((_, reject) => setTimeout(() => reject(new Error('timeout')), 3_000)),
      ]);
      return { status: 'ok', database: 'up' };
    } catch {
      response.status(503);
      return { status: 'unavailable', database: 'down', message: 'The API is running but cannot reach the database.' };
    }
  }
}
