import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { MailModule } from '../mail/mail.module';
import { Trial } from '../trials/models/trial.model';
import { TrialDeparture } from '../trials/models/trial-departure.model';
import { TrialMembership } from '../trials/models/trial-membership.model';
import { User } from '../users/models/user.model';
import { MembersController } from './members.controller';
import { MembersService } from './members.service';
import { SiteNamesService } from './site-names.service';

/** The Team: who is on a trial, with which role and site, and the investigator's changes to it. */
@Module({
  imports: [SequelizeModule.forFeature([TrialMembership, TrialDeparture, Trial, User]), MailModule],
  controllers: [MembersController],
  providers: [MembersService, SiteNamesService],
  exports: [SiteNamesService],
})
export class TeamModule {}
