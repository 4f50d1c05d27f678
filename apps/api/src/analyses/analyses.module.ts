import { Module } from '@nestjs/common';
import { SequelizeModule } from '@nestjs/sequelize';
import { FindingsModule } from '../findings/findings.module';
import { MailModule } from '../mail/mail.module';
import { Trial } from '../trials/models/trial.model';
import { AnalysesController } from './analyses.controller';
import { AnalysesService } from './analyses.service';
import { CommentsService } from './comments.service';
import { AnalysisSignOffRow } from './models/analysis-sign-off.model';
import { AnalysisSnapshotRow } from './models/analysis-snapshot.model';
import { ReviewRequestRow } from './models/review-request.model';
import { SnapshotCommentRevisionRow } from './models/snapshot-comment-revision.model';
import { SnapshotCommentRow } from './models/snapshot-comment.model';
import { ReviewService } from './review.service';

/** Saved analyses (snapshots), their review (sign-offs, requests) and comment threads. */
@Module({
  imports: [
    SequelizeModule.forFeature([AnalysisSnapshotRow, SnapshotCommentRow, SnapshotCommentRevisionRow, AnalysisSignOffRow, ReviewRequestRow, Trial]),
    FindingsModule,
    MailModule,
  ],
  controllers: [AnalysesController],
  providers: [AnalysesService, ReviewService, CommentsService],
  exports: [AnalysesService, CommentsService],
})
export class AnalysesModule {}
