import { Module } from '@nestjs/common';
import { ScheduleModule } from '@nestjs/schedule';
import { SequelizeModule } from '@nestjs/sequelize';
import { MailModule } from '../mail/mail.module';
import { RoundReminder } from './models/round-reminder.model';
import { RemindersService } from './reminders.service';
import { SchedulerLease } from './scheduler-lease';

/** The daily job that e-mails collaborators the day before a round is due at their site. */
@Module({
  imports: [ScheduleModule.forRoot(), SequelizeModule.forFeature([RoundReminder]), MailModule],
  providers: [RemindersService, SchedulerLease],
  exports: [RemindersService],
})
export class RemindersModule {}
