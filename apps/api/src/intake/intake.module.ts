import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { SequelizeModule } from '@nestjs/sequelize';
import { MailModule } from '../mail/mail.module';
import { ObservationsModule } from '../observations/observations.module';
import { PlotRow } from '../plots/models/plot.model';
import { AssessmentRoundRow } from '../rounds/models/assessment-round.model';
import { SiteRow } from '../sites/models/site.model';
import { Trial } from '../trials/models/trial.model';
import { IntakeColumnsService } from './intake-columns.service';
import { IntakeImportsController } from './intake-imports.controller';
import { IntakeImportsService } from './intake-imports.service';
import { IntakeController } from './intake.controller';
import { intakeConfig } from './intake.config';
import { IntakeService } from './intake.service';
import { IntakeColumnChoiceRow } from './models/intake-column-choice.model';
import { IntakeImportRow } from './models/intake-import.model';
import { IntakeUploadRow } from './models/intake-upload.model';

/** Uploads of one site and round (CSV or workbook): stream, check, dry run, all-or-nothing bulk commit, receipt, progress records, remembered columns. */
@Module({
  imports: [
    ConfigModule.forFeature(intakeConfig),
    SequelizeModule.forFeature([IntakeUploadRow, IntakeImportRow, IntakeColumnChoiceRow, Trial, SiteRow, PlotRow, AssessmentRoundRow]),
    MailModule,
    ObservationsModule,
  ],
  controllers: [IntakeController, IntakeImportsController],
  providers: [IntakeService, IntakeImportsService, IntakeColumnsService],
  exports: [IntakeService],
})
export class IntakeModule {}
