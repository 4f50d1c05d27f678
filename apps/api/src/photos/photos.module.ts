import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { SequelizeModule } from '@nestjs/sequelize';
import { PlotRow } from '../plots/models/plot.model';
import { AssessmentRoundRow } from '../rounds/models/assessment-round.model';
import { StorageModule } from '../storage/storage.module';
import { Trial } from '../trials/models/trial.model';
import { PlotPhotoRow } from './models/plot-photo.model';
import { photosConfig } from './photos.config';
import { PhotosController } from './photos.controller';
import { PhotosService } from './photos.service';

/** One optional photo per plot and round (JPEG or PNG by content), kept by the storage service. */
@Module({
  imports: [ConfigModule.forFeature(photosConfig), SequelizeModule.forFeature([PlotPhotoRow, Trial, PlotRow, AssessmentRoundRow]), StorageModule],
  controllers: [PhotosController],
  providers: [PhotosService],
})
export class PhotosModule {}
