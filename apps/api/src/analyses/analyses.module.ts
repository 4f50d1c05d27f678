import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { FindingsModule } from '../findings/findings.module';
import { Trial } from '../trials/models/trial.model';
import { AnalysesController } from './analyses.controller';
import { AnalysesService } from './analyses.service';
import { AnalysisSnapshotRow } from './models/analysis-snapshot.model';
import { SnapshotCommentRow } from './models/snapshot-comment.model';

/** Saved analyses (snapshots), their comments and the investigator's sign-off. */
@Module({
  imports: [SequelizeModule.forFeature([AnalysisSnapshotRow, SnapshotCommentRow, Trial]), FindingsModule],
  controllers: [AnalysesController],
  providers: [AnalysesService],
  exports: [AnalysesService],
})
export class AnalysesModule {}
