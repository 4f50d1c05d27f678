import { Module } from '@nestjs/common';
import { OutboxController } from './outbox.controller';
import { OutboxService } from './outbox.service';

/** Development-only helpers: the Outbox of caught e-mails. */
@Module({
  controllers: [OutboxController],
  providers: [OutboxService],
})
export class DevModule {}
