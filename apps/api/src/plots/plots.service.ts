import type { Plot, PlotAmount } from '@friable/contracts';
import { findUnit } from '@friable/field';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import Papa from 'papaparse';
import { MeasureRow } from '../measures/models/measure.model';
import { AssessmentRoundRow } from '../rounds/models/assessment-round.model';
import { SiteRow } from '../sites/models/site.model';
import { SitesService } from '../sites/sites.service';
import { TreatmentRow } from '../treatments/models/treatment.model';
import { TreatmentsService } from '../treatments/treatments.service';
import { Trial } from '../trials/models/trial.model';
import { PlotRow } from './models/plot.model';
import { plotAmount } from './plot-amount';

/** A measure's CSV column header: its name with its unit in brackets, e.g. `drain time (s)`. */
export function measureHeader(measure: Pick<MeasureRow, 'name' | 'unit'>): string {
  return `${measure.name} (${findUnit(measure.unit)?.id ?? measure.unit})`;
}

@Injectable()
export class PlotsService {
  constructor(
    @InjectModel(PlotRow) private readonly plots: typeof PlotRow,
    @InjectModel(SiteRow) private readonly sites: typeof SiteRow,
    @InjectModel(AssessmentRoundRow) private readonly rounds: typeof AssessmentRoundRow,
    @InjectModel(Trial) private readonly trials: typeof Trial,
    private readonly siteService: SitesService,
    private readonly treatmentService: TreatmentsService,
  ) {}

  async list(trialId: number, siteId?: number): Promise<Plot[]> {
    const rows = await this.plots.findAll({
      where: siteId === undefined ? { trialId } : { trialId, siteId },
      include: [
        { model: SiteRow, attributes: ['id', 'name'] },
        { model: TreatmentRow, attributes: ['id', 'code'] },
      ],
      order: [['siteId', 'ASC'], ['block', 'ASC'], ['position', 'ASC']],
    });
    return rows.map((row) => ({
      id: row.id,
      label: row.label,
      siteId: row.siteId,
      siteName: row.site?.name ?? '',
      block: row.block,
      position: row.position,
      treatmentId: row.treatmentId,
      treatmentCode: row.treatment?.code ?? '',
    }));
  }

  /** The data-entry CSV of one site and round: a row per plot, a column per measure of the round, then notes. */
  async template(trialId: number, siteId: number, roundId: number): Promise<{ filename: string; csv: string }> {
    const trial = await this.trials.findByPk(trialId);
    const site = await this.sites.findOne({ where: { id: siteId, trialId } });
    if (!trial || !site) throw new NotFoundException('No such site in this trial.');
    const round = await this.rounds.findOne({ where: { id: roundId, trialId }, include: [MeasureRow] });
    if (!round) throw new NotFoundException('No such assessment round in this trial.');
    const plots = await this.list(trialId, siteId);
    if (!plots.length) throw new ConflictException(`Site ${site.name} is not randomized yet; randomize it to get its data sheet.`);
    const measures = [...(round.measures ?? [])].sort((a, b) => a.position - b.position || a.id - b.id);
    const fields = ['plot label', 'block', 'treatment code', ...measures.map(measureHeader), 'notes'];
    const data = plots.map((p) => [p.label, String(p.block), p.treatmentCode, ...measures.map(() => ''), '']);
    const csv = `${Papa.unparse({ fields, data }, { newline: '\r\n' })}\r\n`;
    const slug = (text: string) => text.replace(/[^A-Za-z0-9]+/g, '-').replace(/^-|-$/g, '');
    return { filename: `${slug(trial.code)}-${site.labelPrefix}-${slug(round.label)}.csv`, csv };
  }

  /** Per site and treatment: the amount for one plot and for all of the site's plots of it. */
  async amounts(trialId: number, marginPercent: number): Promise<PlotAmount[]> {
    const sites = await this.siteService.list(trialId);
    const treatments = await this.treatmentService.list(trialId);
    const counted = await this.list(trialId);
    const plotsOf = (siteId: number, treatmentId: number) => counted.filter((p) => p.siteId === siteId && p.treatmentId === treatmentId).length;
    // Before randomizing, every design plans one plot of each treatment per block (replicate).
    return sites.flatMap((site) =>
      treatments.map((treatment) => {
        const { problem: _problem, ...amount } = plotAmount(site, treatment, site.plotCount ? plotsOf(site.id, treatment.id) : site.blocks, marginPercent);
        return amount;
      }),
    );
  }
}
