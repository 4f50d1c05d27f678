import { Injectable, Logger } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import Papa from 'papaparse';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import type { AuthUser } from '../common/auth-user';
import { IntakeService } from '../intake/intake.service';
import { measureHeader } from '../plots/plots.service';

/** Invented plot means of FW-CLAY-26 by treatment (demo data only), and how much each garden and round shifts them. */
const treatmentMeans: Record<string, { DRAIN: number; CRUMB: number; WATER: number; CRUST: number }> = {
  CTL: { DRAIN: 510, CRUMB: 2, WATER: 150, CRUST: 2.8 },
  GYP: { DRAIN: 260, CRUMB: 3, WATER: 185, CRUST: 1.6 },
  CMP: { DRAIN: 300, CRUMB: 4, WATER: 240, CRUST: 1.9 },
  SHL: { DRAIN: 400, CRUMB: 2, WATER: 160, CRUST: 2.5 },
  LFM: { DRAIN: 340, CRUMB: 3, WATER: 205, CRUST: 2.2 },
};
const siteShift: Record<string, number> = { HL: 90, MB: -70, QH: 20 };
/** Missing values with their reasons, by garden, round, plot and measure. */
const missingCells: ReadonlyArray<{ site: string; round: string; plot: string; measure: string; reason: string }> = [
  { site: 'MB', round: 'Day 0', plot: 'MB-B2-P03', measure: 'CRUST', reason: 'penetrometer borrowed by another garden' },
  { site: 'QH', round: 'Day 14', plot: 'QH-B4-P01', measure: 'WATER', reason: 'half-barrel tipped over in the storm' },
  { site: 'HL', round: 'Day 14', plot: 'HL-B3-P05', measure: 'DRAIN', reason: 'bed flooded by the blocked gutter' },
];

/** A repeatable number from -1 to 1 for a text (FNV-1a hash): the same plot gets the same jitter on every load. */
function jitter(text: string): number {
  let hash = 0x811c9dc5;
  for (const character of text) hash = Math.imul(hash ^ character.charCodeAt(0), 0x01000193) >>> 0;
  return (hash / 0xffffffff) * 2 - 1;
}

interface DemoPlot {
  label: string;
  block: number;
  treatmentCode: string;
}

interface DemoMeasure {
  code: string;
  name: string;
  unit: string;
}

/** One plot's cells, as a collaborator would type them: whole seconds, >600 when not drained, scores 1 to 5, mL, two decimals. */
function plotCells(plot: DemoPlot, prefix: string, round: string, measures: readonly DemoMeasure[]): { cells: string[]; reason: string } {
  const mean = treatmentMeans[plot.treatmentCode] ?? treatmentMeans.CTL!;
  const later = round === 'Day 0' ? 0 : 1;
  let reason = '';
  const cells = measures.map((measure) => {
    const missing = missingCells.find((cell) => cell.site === prefix && cell.round === round && cell.plot === plot.label && cell.measure === measure.code);
    if (missing) {
      reason = missing.reason;
      return 'NA';
    }
    const noise = jitter(`${plot.label}|${round}|${measure.code}`);
    if (measure.code === 'DRAIN') {
      const seconds = Math.round(mean.DRAIN + (siteShift[prefix] ?? 0) - 40 * later + 70 * noise);
      return seconds > 600 ? '>600' : String(Math.max(20, seconds));
    }
    if (measure.code === 'CRUMB') return String(Math.min(5, Math.max(1, mean.CRUMB + later * (plot.treatmentCode === 'CTL' ? 0 : 1) + Math.round(noise * 0.8))));
    if (measure.code === 'WATER') return String(Math.round(mean.WATER - (siteShift[prefix] ?? 0) / 4 + 10 * later + 30 * noise));
    return (mean.CRUST + (siteShift[prefix] ?? 0) / 200 - 0.2 * later + 0.4 * noise).toFixed(2);
  });
  return { cells, reason };
}

/**
 * Demo observations — fills FW-CLAY-26 with invented values for its first two rounds at all three
 * gardens, a few drain times written >600 (not drained by the cut-off) and a few values missing
 * with their reasons, entered through Intake itself: CSV text in the template's columns, run through
 * IntakeService like an upload. Idempotent: a site and round that already hold observations is left alone.
 * Throws: whatever Intake refuses (the demo data must pass the same checks as any upload).
 */
@Injectable()
export class DemoObservationsService {
  private readonly logger = new Logger('Demo');

  constructor(
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly intake: IntakeService,
  ) {}

  async fill(trialCode: string, rounds = 2): Promise<number> {
    const [trial] = await this.sequelize.query<{ id: number; createdBy: number }>('SELECT id, created_by AS createdBy FROM trials WHERE code = ?', { replacements: [trialCode], type: QueryTypes.SELECT });
    if (!trial) return 0;
    const [owner] = await this.sequelize.query<AuthUser>('SELECT id, email, name, is_admin AS isAdmin FROM users WHERE id = ?', { replacements: [trial.createdBy], type: QueryTypes.SELECT });
    if (!owner) throw new Error(`demo trial ${trialCode} has no owner`);
    const user: AuthUser = { id: Number(owner.id), email: owner.email, name: owner.name, isAdmin: Boolean(owner.isAdmin) };
    const sites = await this.sequelize.query<{ id: number; prefix: string }>('SELECT id, label_prefix AS prefix FROM sites WHERE trial_id = ? ORDER BY id', { replacements: [trial.id], type: QueryTypes.SELECT });
    const roundRows = await this.sequelize.query<{ id: number; label: string }>('SELECT id, label FROM assessment_rounds WHERE trial_id = ? ORDER BY day_offset, id LIMIT ?', {
      replacements: [trial.id, rounds],
      type: QueryTypes.SELECT,
    });
    let filled = 0;
    for (const site of sites) {
      for (const round of roundRows) {
        if (await this.hasObservations(trial.id, site.id, round.id)) continue;
        const csv = await this.csvFor(trial.id, site, round);
        const access = { trialId: trial.id, roles: ['investigator' as const], siteIds: [], adminReadOnly: false };
        const fileName = `${trialCode}-${site.prefix}-${round.label.replace(/\s+/g, '-')}.csv`;
        await this.intake.intake(access, user, site.id, round.id, { source: { bytes: Buffer.from(csv) }, fileName }, { dryRun: false, acceptWarnings: true, receipt: false });
        filled += 1;
      }
    }
    if (filled) this.logger.log(`observations of ${trialCode} loaded (${filled} site and round uploads)`);
    return filled;
  }

  private async hasObservations(trialId: number, siteId: number, roundId: number): Promise<boolean> {
    const [row] = await this.sequelize.query<{ n: number }>(
      'SELECT COUNT(*) AS n FROM observations o JOIN plots p ON p.id = o.plot_id WHERE o.trial_id = ? AND o.round_id = ? AND p.site_id = ?',
      { replacements: [trialId, roundId, siteId], type: QueryTypes.SELECT },
    );
    return Number(row!.n) > 0;
  }

  /** The site and round's template (plot label, block, treatment code, a column per measure, notes) with a missing-reason column, filled in. */
  private async csvFor(trialId: number, site: { id: number; prefix: string }, round: { id: number; label: string }): Promise<string> {
    const measures = await this.sequelize.query<DemoMeasure>(
      'SELECT m.code, m.name, m.unit FROM round_measures rm JOIN measures m ON m.id = rm.measure_id WHERE rm.round_id = ? ORDER BY m.position, m.id',
      { replacements: [round.id], type: QueryTypes.SELECT },
    );
    const plots = await this.sequelize.query<DemoPlot>(
      'SELECT p.label, p.block, t.code AS treatmentCode FROM plots p JOIN treatments t ON t.id = p.treatment_id WHERE p.trial_id = ? AND p.site_id = ? ORDER BY p.block, p.position',
      { replacements: [trialId, site.id], type: QueryTypes.SELECT },
    );
    const fields = ['plot label', 'block', 'treatment code', ...measures.map(measureHeader), 'missing reason', 'notes'];
    const data = plots.map((plot) => {
      const { cells, reason } = plotCells(plot, site.prefix, round.label, measures);
      const note = cells[measures.findIndex((measure) => measure.code === 'DRAIN')] === '>600' ? 'still ponded when the timer stopped' : '';
      return [plot.label, String(plot.block), plot.treatmentCode, ...cells, reason, note];
    });
    return `${Papa.unparse({ fields, data }, { newline: '\r\n' })}\r\n`;
  }
}
