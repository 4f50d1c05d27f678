import { Module } from '@nestjs/common';
import { MailService } from './mail.service';

/** Outgoing e-mail over SMTP (the mail config is loaded by the root ConfigModule). */
@Module({
  providers: [MailService],
  exports: [MailService],
})
export class MailModule {}
