import { Controller, Get } from '@nestjs/common';
import { ApiForbiddenResponse, ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { AdminOnly } from '../common/decorators/access.decorator';
import { OutboxService } from './outbox.service';

@ApiTags('development')
@Controller('dev/outbox')
export class OutboxController {
  constructor(private readonly outbox: OutboxService) {}

  @Get()
  // Administrators only: the caught e-mails hold every invitation link, which anyone could accept.
  @AdminOnly()
  @ApiOkResponse({ description: 'OutboxMessage[]: e-mails the local SMTP sink caught, newest first.' })
  @ApiForbiddenResponse({ description: 'Only an instance administrator may read the Outbox.' })
  @ApiNotFoundResponse({ description: 'NODE_ENV is production: there is no Outbox.' })
  list() {
    return this.outbox.list();
  }
}
