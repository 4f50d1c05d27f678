import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { Trial } from './models/trial.model';
import { TrialMembership } from './models/trial-membership.model';
import { TrialMembershipsService } from './trial-memberships.service';
import { TrialsController } from './trials.controller';
import { TrialsService } from './trials.service';

@Module({
  imports: [SequelizeModule.forFeature([Trial, TrialMembership])],
  controllers: [TrialsController],
  providers: [TrialsService, TrialMembershipsService],
  exports: [TrialMembershipsService],
})
export class TrialsModule {}
