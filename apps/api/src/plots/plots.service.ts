import type { LevelAmount, Plot, PlotAmount } from '@friable/contracts';
import { DESIGN_RULES, findUnit, plotsPerAppliedUnit } from '@friable/field';
import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import Papa from 'papaparse';
import { FactorsService } from '../factors/factors.service';
import { MeasureRow } from '../measures/models/measure.model';
import { AssessmentRoundRow } from '../rounds/models/assessment-round.model';
import { SiteRow } from '../sites/models/site.model';
import { SitesService } from '../sites/sites.service';
import { TreatmentRow } from '../treatments/models/treatment.model';
import { TreatmentsService } from '../treatments/treatments.service';
import { Trial } from '../trials/models/trial.model';
import { presentMeasure } from '../measures/measure.presenter';
import { PlotRow } from './models/plot.model';
import { templateWorkbook, type TemplateTable } from './template-workbook';
import { levelDoseInput, plotAmount, unitAmount } from './plot-amount';

/** A split plot's whole-plot label: its plot label up to the whole plot (`HL-B2-W3-S2` → `HL-B2-W3`); null for other designs. */
export function wholePlotLabel(plot: Pick<PlotRow, 'label' | 'wholePlot'>): string | null {
  if (plot.wholePlot === null) return null;
  return /^(.*-W\d+)-S\d+/.exec(plot.label)?.[1] ?? null;
}

/** The plot-identity columns a split plot's template adds after the block: whole plot, sub plot (and sub-sub plot). */
export function plotUnitColumns(plots: ReadonlyArray<Pick<Plot, 'wholePlot' | 'subSubPlot'>>): Array<{ header: string; key: 'wholePlot' | 'subPlot' | 'subSubPlot' }> {
  if (!plots.some((p) => p.wholePlot !== null)) return [];
  return [
    { header: 'whole plot', key: 'wholePlot' },
    { header: 'sub plot', key: 'subPlot' },
    ...(plots.some((p) => p.subSubPlot !== null) ? [{ header: 'sub-sub plot', key: 'subSubPlot' as const }] : []),
  ];
}

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
    private readonly factorService: FactorsService,
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
      wholePlot: row.wholePlot,
      subPlot: row.subPlot,
      subSubPlot: row.subSubPlot,
      wholePlotLabel: wholePlotLabel(row),
    }));
  }

  /** The data-entry CSV of one site and round: a row per plot, a column per measure of the round, then the reason for a value left NA and notes. */
  async template(trialId: number, siteId: number, roundId: number): Promise<{ filename: string; csv: string }> {
    const { stem, table } = await this.templateTable(trialId, siteId, roundId);
    const fields = [...table.fixedHeaders, ...table.measures.map((entry) => entry.header), 'missing reason', 'notes'];
    const data = table.fixedRows.map((cells) => [...cells.map(String), ...table.measures.map(() => ''), '', '']);
    return { filename: `${stem}.csv`, csv: `${Papa.unparse({ fields, data }, { newline: '\r\n' })}\r\n` };
  }

  /** The same data sheet as a workbook: the plots' columns locked, each measure's cells checked as they are typed. */
  async templateWorkbook(trialId: number, siteId: number, roundId: number): Promise<{ filename: string; bytes: Buffer }> {
    const { stem, table } = await this.templateTable(trialId, siteId, roundId);
    return { filename: `${stem}.xlsx`, bytes: await templateWorkbook(table) };
  }

  private async templateTable(trialId: number, siteId: number, roundId: number): Promise<{ stem: string; table: TemplateTable }> {
    const trial = await this.trials.findByPk(trialId);
    const site = await this.sites.findOne({ where: { id: siteId, trialId } });
    if (!trial || !site) throw new NotFoundException('No such site in this trial.');
    const round = await this.rounds.findOne({ where: { id: roundId, trialId }, include: [MeasureRow] });
    if (!round) throw new NotFoundException('No such assessment round in this trial.');
    const plots = await this.list(trialId, siteId);
    if (!plots.length) throw new ConflictException(`Site ${site.name} is not randomized yet; randomize it to get its data sheet.`);
    const measures = [...(round.measures ?? [])].sort((a, b) => a.position - b.position || a.id - b.id);
    const units = plotUnitColumns(plots);
    const slug = (text: string) => text.replace(/[^A-Za-z0-9]+/g, '-').replace(/^-|-$/g, '');
    return {
      stem: `${slug(trial.code)}-${site.labelPrefix}-${slug(round.label)}`,
      table: {
        sheetName: round.label,
        fixedHeaders: ['plot label', 'block', ...units.map((unit) => unit.header), 'treatment code'],
        fixedRows: plots.map((p) => [p.label, p.block, ...units.map((unit) => p[unit.key] ?? ''), p.treatmentCode]),
        measures: measures.map((measure) => ({ measure: presentMeasure(measure), header: measureHeader(measure) })),
      },
    };
  }

  /**
   * Per site and factor level (factorial and split-plot trials): the amount for one unit the level is applied to —
   * a plot, or a split plot's whole plot (its sub plots side by side) — and for all of the site's units of it.
   */
  async levelAmounts(trialId: number, marginPercent: number): Promise<LevelAmount[]> {
    const trial = await this.trials.findByPk(trialId);
    if (!trial) throw new NotFoundException('No such trial.');
    const factors = await this.factorService.list(trialId, trial.design);
    const rule = DESIGN_RULES[trial.design];
    if (factors.length < rule.minFactors || factors.length > rule.maxFactors || factors.length === 0) return [];
    const sites = await this.siteService.list(trialId);
    const treatments = await this.treatmentService.list(trialId);
    const plots = await this.list(trialId);
    const levelCounts = factors.map((factor) => factor.levels.length);
    const combinations = levelCounts.reduce((product, count) => product * count, 1);
    const treatmentHas = new Map(treatments.map((t) => [t.id, new Set(t.factorLevelIds)]));
    return sites.flatMap((site) => {
      const sitePlots = plots.filter((p) => p.siteId === site.id);
      return factors.flatMap((factor, index) => {
        const plotsPerUnit = plotsPerAppliedUnit(trial.design, levelCounts, index);
        return factor.levels.map((level): LevelAmount => {
          // Before randomizing, the plan: every combination once per block.
          const plotsOfLevel = site.plotCount ? sitePlots.filter((p) => treatmentHas.get(p.treatmentId)?.has(level.id)).length : (site.blocks * combinations) / factor.levels.length;
          const units = Math.round(plotsOfLevel / plotsPerUnit);
          const { perUnit, siteTotal, problem } = unitAmount(levelDoseInput(level, site, plotsPerUnit), units, marginPercent);
          return {
            siteId: site.id,
            factorId: factor.id,
            factorName: factor.name,
            levelId: level.id,
            levelCode: level.code,
            levelName: level.name,
            appliedTo: factor.appliedTo,
            plotsPerUnit,
            unitAreaM2: site.areaM2 * plotsPerUnit,
            units,
            perUnit,
            siteTotal,
            problem: problem ?? null,
          };
        });
      });
    });
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
