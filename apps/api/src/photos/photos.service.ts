import type { PlotPhoto } from '@friable/contracts';
import { Injectable, NotFoundException, UnprocessableEntityException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { ActivityService } from '../activity/activity.service';
import type { AuthUser, TrialAccessContext } from '../common/auth-user';
import { refuseIfClosed } from '../common/exceptions/trial-locked.exception';
import { ProtocolGateService } from '../protocol-gate/protocol-gate.service';
import { assertMayWriteSite } from '../observations/site-write-access';
import { PlotRow } from '../plots/models/plot.model';
import { AssessmentRoundRow } from '../rounds/models/assessment-round.model';
import { SiteRow } from '../sites/models/site.model';
import { StorageService } from '../storage/storage.service';
import { Trial } from '../trials/models/trial.model';
import { imageType } from './image-type';
import { PlotPhotoRow } from './models/plot-photo.model';

const present = (row: PlotPhotoRow): PlotPhoto => ({
  plotId: row.plotId,
  roundId: row.roundId,
  contentType: row.contentType as PlotPhoto['contentType'],
  sizeBytes: row.sizeBytes,
  uploadedById: row.uploadedBy,
  uploadedAt: row.updatedAt.toISOString(),
});

/**
 * Plot photos — one optional JPEG or PNG per plot and round, its type checked from the bytes,
 * kept by the storage service; writes refused on a locked trial and outside the caller's sites.
 * Throws (as HTTP answers): 403, 404, 409 (locked), 422 (not a JPEG or PNG image).
 */
@Injectable()
export class PhotosService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    @InjectModel(Trial) private readonly trials: typeof Trial,
    @InjectModel(PlotRow) private readonly plots: typeof PlotRow,
    @InjectModel(AssessmentRoundRow) private readonly rounds: typeof AssessmentRoundRow,
    @InjectModel(PlotPhotoRow) private readonly photos: typeof PlotPhotoRow,
    private readonly storage: StorageService,
    private readonly gate: ProtocolGateService,
    private readonly activity: ActivityService,
  ) {}

  private async place(trialId: number, plotId: number, roundId: number): Promise<{ plot: PlotRow; round: AssessmentRoundRow }> {
    const plot = await this.plots.findOne({ where: { id: plotId, trialId }, include: [{ model: SiteRow, attributes: ['id', 'name'] }] });
    if (!plot) throw new NotFoundException('No such plot in this trial.');
    const round = await this.rounds.findOne({ where: { id: roundId, trialId } });
    if (!round) throw new NotFoundException('No such assessment round in this trial.');
    return { plot, round };
  }

  private async openForWrite(access: TrialAccessContext, plotId: number, roundId: number) {
    const place = await this.place(access.trialId, plotId, roundId);
    assertMayWriteSite(access, place.plot.siteId, place.plot.site?.name ?? 'this site');
    const trial = (await this.trials.findByPk(access.trialId))!;
    refuseIfClosed(trial);
    return place;
  }

  async get(trialId: number, plotId: number, roundId: number): Promise<{ photo: PlotPhoto; bytes: Buffer }> {
    const row = await this.photos.findOne({ where: { trialId, plotId, roundId } });
    const bytes = row ? await this.storage.get(row.storageKey) : null;
    if (!row || !bytes) throw new NotFoundException('This plot has no photo for this round.');
    return { photo: present(row), bytes };
  }

  /** The name a downloaded photo gets: the plot's label and the round's, "TG-B1-P01 Day 0.png". */
  async downloadName(trialId: number, plotId: number, roundId: number, photo: PlotPhoto): Promise<string> {
    const { plot, round } = await this.place(trialId, plotId, roundId);
    const name = `${plot.label} ${round.label}`.replace(/[^\p{L}\p{N} ._-]+/gu, '-').slice(0, 100);
    return `${name}.${photo.contentType === 'image/png' ? 'png' : 'jpg'}`;
  }

  async put(access: TrialAccessContext, user: AuthUser, plotId: number, roundId: number, bytes: Buffer | undefined): Promise<PlotPhoto> {
    const { plot, round } = await this.openForWrite(access, plotId, roundId);
    if (!bytes || bytes.length === 0) throw new UnprocessableEntityException('Send the photo as multipart/form-data in the form field "file".');
    const type = imageType(bytes);
    if (!type) throw new UnprocessableEntityException('The file is not a JPEG or PNG image (checked from its content, not its name). Send a photo in one of those formats.');
    const key = `photos/${access.trialId}/${plot.id}-${round.id}-${Date.now()}.${type.extension}`;
    await this.storage.put(key, bytes);
    let replacedKey: string | null = null;
    try {
      const row = await this.sequelize.transaction(async (transaction) => {
        await this.gate.openForWrite(access.trialId, transaction);
        const existing = await this.photos.findOne({ where: { plotId: plot.id, roundId: round.id }, transaction, lock: transaction.LOCK.UPDATE });
        replacedKey = existing?.storageKey ?? null;
        const fields = { storageKey: key, contentType: type.contentType, sizeBytes: bytes.length, uploadedBy: user.id };
        const saved = existing ? await existing.update(fields, { transaction }) : await this.photos.create({ trialId: access.trialId, plotId: plot.id, roundId: round.id, ...fields }, { transaction });
        await this.activity.record(transaction, {
          trialId: access.trialId,
          userId: user.id,
          kind: existing ? 'photo.replaced' : 'photo.added',
          siteId: plot.siteId,
          summary: `${existing ? 'Replaced the' : 'Added a'} photo of ${plot.label}, ${round.label}.`,
          details: { plotId: plot.id, roundId: round.id, contentType: type.contentType, sizeBytes: bytes.length },
        });
        return saved;
      });
      if (replacedKey) await this.storage.delete(replacedKey);
      return present(row);
    } catch (error) {
      await this.storage.delete(key);
      throw error;
    }
  }

  async remove(access: TrialAccessContext, user: AuthUser, plotId: number, roundId: number): Promise<void> {
    const { plot, round } = await this.openForWrite(access, plotId, roundId);
    const key = await this.sequelize.transaction(async (transaction) => {
      await this.gate.openForWrite(access.trialId, transaction);
      const existing = await this.photos.findOne({ where: { plotId: plot.id, roundId: round.id }, transaction, lock: transaction.LOCK.UPDATE });
      if (!existing) throw new NotFoundException('This plot has no photo for this round.');
      await existing.destroy({ transaction });
      await this.activity.record(transaction, {
        trialId: access.trialId,
        userId: user.id,
        kind: 'photo.removed',
        siteId: plot.siteId,
        summary: `Removed the photo of ${plot.label}, ${round.label}.`,
        details: { plotId: plot.id, roundId: round.id },
      });
      return existing.storageKey;
    });
    await this.storage.delete(key);
  }
}
