import { Controller, Get } from '@nestjs/common';
import { ApiNotFoundResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { SignedIn } from '../common/decorators/access.decorator';
import { OutboxService } from './outbox.service';
import { OutboxMessageDto } from './dto/outbox-message.dto';

@ApiTags('development')
@Controller('dev/outbox')
export class OutboxController {
  constructor(private readonly outbox: OutboxService) {}

  @Get()
  @SignedIn()
  @ApiOkResponse({ type: [OutboxMessageDto], description: 'OutboxMessage[]: e-mails the local SMTP sink caught, newest first.' })
  @ApiNotFoundResponse({ description: 'NODE_ENV is production: there is no Outbox.' })
  list() {
    return this.outbox.list();
  }
}
