import { EXPORT_CSV_COLUMNS, isModelFindings, type Findings, type FindingsAnswer, type SavedAnalysisChoices, type TrialDetail } from '@friable/contracts';
import { Injectable } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { AnalysesService } from '../analyses/analyses.service';
import { FindingsService } from '../findings/findings.service';
import { modelTables } from '../findings/model-tables';
import { neutraliseFormula } from '../intake/parsing';
import { ObservationQueryService } from '../observations/observation-query.service';
import { DATA_DICTIONARY, tidyExportRows } from './tidy-export-rows';

type Cell = string | number | boolean | null;

/** The model options a saved analysis ran with, as field rows (none for the classical ANOVA). */
const modelChoiceRows = (choices: SavedAnalysisChoices): Array<[string, Cell]> =>
  (
    [
      ['distribution', choices.distribution],
      ['within-plot covariance', choices.covariance],
      ['count family', choices.family],
      ['covariate measure id', choices.covariateMeasureId],
      ['covariate round id', choices.covariateRoundId],
    ] as Array<[string, Cell | undefined]>
  ).filter((row): row is [string, Cell] => row[1] !== undefined);

/** A text cell made safe; numbers and empty cells pass as they are. */
const safe = (value: Cell): Cell => (typeof value === 'string' ? neutraliseFormula(value) : value);

function addTable(sheet: ExcelJS.Worksheet, header: string[], rows: Cell[][]): void {
  const headerRow = sheet.addRow(header.map(safe));
  headerRow.font = { bold: true };
  for (const row of rows) sheet.addRow(row.map(safe));
  sheet.addRow([]);
}

/**
 * Exports — the tidy CSV of every stored value with its data dictionary, and a workbook (exceljs) with the
 * protocol, the plot plans, the data, the dictionary and each saved analysis. Every text cell passes through
 * neutraliseFormula so a spreadsheet shows it instead of running it.
 * Throws: nothing of its own (404 for an unknown trial through the protocol read).
 */
@Injectable()
export class ExportsService {
  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly findings: FindingsService,
    private readonly observations: ObservationQueryService,
    private readonly analyses: AnalysesService,
  ) {}

  async csv(trialId: number): Promise<{ filename: string; csv: string }> {
    const protocol = await this.findings.protocol(trialId);
    const rows = tidyExportRows(protocol.code, await this.observations.list(trialId), protocol.measures);
    return { filename: `${protocol.code}-observations.csv`, csv: Papa.unparse({ fields: [...EXPORT_CSV_COLUMNS], data: rows.map((r) => EXPORT_CSV_COLUMNS.map((c) => r[c])) }) + '\r\n' };
  }

  async dictionaryCsv(trialId: number): Promise<{ filename: string; csv: string }> {
    const protocol = await this.findings.protocol(trialId);
    const csv = Papa.unparse({ fields: ['column', 'meaning', 'type'], data: DATA_DICTIONARY.map((d) => [d.column, neutraliseFormula(d.meaning), neutraliseFormula(d.type)]) });
    return { filename: `${protocol.code}-data-dictionary.csv`, csv: csv + '\r\n' };
  }

  async workbook(trialId: number): Promise<{ filename: string; bytes: Buffer }> {
    const protocol = await this.findings.protocol(trialId);
    const book = new ExcelJS.Workbook();
    book.creator = 'Friable';
    this.protocolSheet(book.addWorksheet('Protocol'), protocol);
    await this.plotPlanSheet(book.addWorksheet('Plot plans'), trialId);
    const data = book.addWorksheet('Data');
    const rows = tidyExportRows(protocol.code, await this.observations.list(trialId), protocol.measures);
    addTable(
      data,
      [...EXPORT_CSV_COLUMNS],
      rows.map((r) => EXPORT_CSV_COLUMNS.map((c) => (c === 'block' || ((c === 'value' || c === 'censor_limit') && r[c] !== '') ? Number(r[c]) : c === 'censored' ? r[c] === 'true' : r[c]))),
    );
    addTable(book.addWorksheet('Dictionary'), ['column', 'meaning', 'type'], DATA_DICTIONARY.map((d) => [d.column, d.meaning, d.type]));
    for (const snapshot of await this.analyses.all(trialId)) {
      const sheet = book.addWorksheet(`Analysis ${snapshot.id}`);
      addTable(sheet, ['field', 'value'], [
        ['title', snapshot.title],
        ['measure', snapshot.measureName],
        ['round', snapshot.roundLabel],
        ['scope', snapshot.scopeLabel],
        ['analysis', snapshot.analysisLabel],
        ...modelChoiceRows(snapshot.choices),
        ['method', snapshot.choices.method],
        ['alpha', snapshot.choices.alpha],
        ['sites are', snapshot.choices.sitesAre],
        ['transform', snapshot.choices.transform],
        ['data hash (SHA-256)', snapshot.dataHash],
        ['engine version', snapshot.engineVersion],
        ['saved by', snapshot.createdBy],
        ['saved at', snapshot.createdAt],
        ['review', snapshot.review.label],
        ...snapshot.signOffs.map((s, i): [string, string] => [
          `sign-off ${i + 1}`,
          `${s.name} (${s.role}), ${s.signedAt}: "${s.statement}"${s.amendedAt ? ` (amended ${s.amendedAt})` : ''}${
            s.state === 'withdrawn' ? ` — withdrawn ${s.withdrawnAt}: ${s.withdrawalReason}` : s.state === 'data-changed' ? ' — data changed after sign-off' : ''
          }`,
        ]),
      ]);
      this.analysisTables(sheet, snapshot.result);
    }
    const bytes = Buffer.from(await book.xlsx.writeBuffer());
    return { filename: `${protocol.code}.xlsx`, bytes };
  }

  private protocolSheet(sheet: ExcelJS.Worksheet, p: TrialDetail): void {
    addTable(sheet, ['field', 'value'], [
      ['code', p.code],
      ['title', p.title],
      ['question', p.question],
      ['design', p.design],
      ['status', p.status],
      ['start date', p.startDate],
      ['seed', p.seed],
      ['safety notes', p.safetyNotes],
      ['no control because', p.noControlReason],
    ]);
    addTable(sheet, ['treatment', 'name', 'control', 'rate', 'rate unit', 'product', 'description'], p.treatments.map((t) => [t.code, t.name, t.isControl, t.rateValue, t.rateUnit, t.product, t.description]));
    addTable(
      sheet,
      ['measure', 'name', 'unit', 'kind', 'cut-off', 'higher is better', 'decimals'],
      p.measures.map((m) => [m.code, m.name, m.unit, m.kind, m.cutoff, m.higherIsBetter, m.decimals]),
    );
    const measureCodes = new Map(p.measures.map((m) => [m.id, m.code]));
    addTable(sheet, ['round', 'day', 'due', 'measures'], p.rounds.map((r) => [r.label, r.dayOffset, r.dueDate, r.measureIds.map((id) => measureCodes.get(id) ?? '').join(' ')]));
    addTable(sheet, ['site', 'location', 'soil', 'blocks', 'plot area (m²)', 'label prefix', 'lead', 'randomized at'], p.sites.map((s) => [s.name, s.location, s.soilDescription, s.blocks, s.areaM2, s.labelPrefix, s.leadName, s.randomizedAt]));
  }

  private async plotPlanSheet(sheet: ExcelJS.Worksheet, trialId: number): Promise<void> {
    const plots = await this.sequelize.query<{ site: string; block: number; position: number; label: string; treatment: string }>(
      `SELECT s.name AS site, p.block, p.position, p.label, t.code AS treatment
         FROM plots p JOIN sites s ON s.id = p.site_id JOIN treatments t ON t.id = p.treatment_id
        WHERE s.trial_id = ? ORDER BY s.id, p.block, p.position`,
      { replacements: [trialId], type: QueryTypes.SELECT },
    );
    addTable(sheet, ['site', 'block', 'position', 'plot label', 'treatment'], plots.map((p) => [p.site, Number(p.block), Number(p.position), p.label, p.treatment]));
  }

  private analysisTables(sheet: ExcelJS.Worksheet, result: FindingsAnswer): void {
    if (isModelFindings(result)) {
      for (const table of modelTables(result)) {
        addTable(sheet, [table.title], []);
        addTable(sheet, table.columns, table.rows);
      }
      addTable(sheet, ['warning'], [...result.warnings, ...result.context.notices].map((w) => [w]));
      return;
    }
    addTable(sheet, ['term', 'df', 'SS', 'MS', 'F', 'p'], result.anova.map((r) => [r.term, r.df, r.ss, r.ms, r.f, r.p]));
    addTable(sheet, ['n', 'grand mean', 'CV %', 'root MSE', 'error df'], [[result.summary.n, result.summary.grandMean, result.summary.cv, result.summary.rootMse, result.summary.errorDf]]);
    const letters = result.letters[result.context.choices.method as keyof Findings['letters']] ?? {};
    const percent = new Map(result.context.percentOfControl.map((p) => [p.treatment, p.percent]));
    addTable(sheet, ['treatment', 'n', 'LS mean', 'SE', 'letters', '% of control'], result.means.map((m) => [m.treatment, m.n, m.mean, m.se, letters[m.treatment] ?? null, percent.get(m.treatment) ?? null]));
    addTable(sheet, ['warning'], [...result.warnings, ...result.context.notices].map((w) => [w]));
  }
}
