import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { SequelizeModule } from '@nestjs/sequelize';
import { MailModule } from '../mail/mail.module';
import { ObservationsModule } from '../observations/observations.module';
import { PlotRow } from '../plots/models/plot.model';
import { AssessmentRoundRow } from '../rounds/models/assessment-round.model';
import { SiteRow } from '../sites/models/site.model';
import { Trial } from '../trials/models/trial.model';
import { IntakeController } from './intake.controller';
import { intakeConfig } from './intake.config';
import { IntakeService } from './intake.service';
import { IntakeUploadRow } from './models/intake-upload.model';

/** CSV upload of one site and round: parse, validate, dry run, all-or-nothing commit, receipt. */
@Module({
  imports: [
    ConfigModule.forFeature(intakeConfig),
    SequelizeModule.forFeature([IntakeUploadRow, Trial, SiteRow, PlotRow, AssessmentRoundRow]),
    MailModule,
    ObservationsModule,
  ],
  controllers: [IntakeController],
  providers: [IntakeService],
  exports: [IntakeService],
})
export class IntakeModule {}
