import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { TrialMembership } from '../trials/models/trial-membership.model';
import { MembersController } from './members.controller';
import { MembersService } from './members.service';
import { SiteNamesService } from './site-names.service';

/** The Team: who is on a trial, with which role and site. */
@Module({
  imports: [SequelizeModule.forFeature([TrialMembership])],
  controllers: [MembersController],
  providers: [MembersService, SiteNamesService],
  exports: [SiteNamesService],
})
export class TeamModule {}
