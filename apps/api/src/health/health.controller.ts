import { Controller, Get, Res } from '@nestjs/common';
import { ApiOkResponse, ApiServiceUnavailableResponse, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Public } from '../common/decorators/access.decorator';
import { RETRY_AFTER_SECONDS } from '../common/filters/problem.filter';
import { DatabaseWatchService } from './database-watch.service';

@ApiTags('health')
@Controller('health')
export class HealthController {
  constructor(private readonly database: DatabaseWatchService) {}

  @Get()
  @Public()
  @ApiOkResponse({ description: '{"status":"ok","database":"up"}' })
  @ApiServiceUnavailableResponse({ description: 'Names what is down.' })
  async check(@Res({ passthrough: true }) response: Response) {
    // A check of its own (answered within a second or counted as down), not the last one's result.
    if (await this.database.check()) return { status: 'ok', database: 'up' };
    response.status(503);
    response.setHeader('Retry-After', String(RETRY_AFTER_SECONDS));
    return { status: 'unavailable', database: 'down', message: 'The API is running but cannot reach the database.' };
  }
}
