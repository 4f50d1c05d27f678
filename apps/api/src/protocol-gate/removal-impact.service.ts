import type { RemovalImpact, RemovalImpactSite } from '@friable/contracts';
import { Injectable } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import { QueryTypes, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { throwIfProblems } from '../common/exceptions/field-problems.exception';

/** What is removed: one measure (its values in every round) or one round (its values of every measure, and its photos). */
export type RemovalTarget =
  | { kind: 'measure'; id: number; code: string; name: string }
  | { kind: 'round'; id: number; label: string };

const count = (n: number, one: string, many: string) => `${n.toLocaleString('en-US')} ${n === 1 ? one : many}`;

function listInWords(parts: string[]): string {
  return parts.length <= 1 ? (parts[0] ?? '') : `${parts.slice(0, -1).join(', ')} and ${parts.at(-1)}`;
}

/**
 * Removal impact — what removing a measure or an assessment round would take out of the Ledger, Findings,
 * exports and reports, in numbers per site and in words, and the typed confirmation such a removal needs.
 *
 * Values of archived measures and rounds stay in the observations table (the measure or round row is archived,
 * never erased); the readers leave them out. Only values still shown are counted, so a value of a round archived
 * earlier is not counted again when its measure goes.
 * Throws: `checkConfirmation` — 422 naming the confirmation when data would go and the trial code was not typed.
 * Example: `await impact.of(7, { kind: 'round', id: 3, label: 'Week 2' })` → `{ values: 240, photos: 5, … }`
 */
@Injectable()
export class RemovalImpactService {
  constructor(@InjectConnection() private readonly sequelize: Sequelize) {}

  async of(trialId: number, target: RemovalTarget, refusal: string | null = null, transaction?: Transaction): Promise<RemovalImpact> {
    const sites = await this.countBySite(trialId, target, transaction);
    const total = (key: keyof Omit<RemovalImpactSite, 'siteId' | 'siteName'>) => sites.reduce((sum, site) => sum + site[key], 0);
    const [values, censored, missing, notes, photos] = [total('values'), total('censored'), total('missing'), total('notes'), total('photos')];
    const item = target.kind === 'measure' ? `measure ${target.code} (${target.name})` : `round ${target.label}`;
    return { item, sites, values, censored, missing, notes, photos, summary: this.summary(target, sites, { values, censored, missing, notes, photos }), confirmationNeeded: values + photos > 0, refusal };
  }

  /** Refuses (422, naming the confirmation) a removal that archives data unless the trial's code was typed, in any case. */
  checkConfirmation(impact: RemovalImpact, trialCode: string, typed: string | undefined): void {
    if (!impact.confirmationNeeded) return;
    const loses = lossInWords(impact);
    const given = typed?.trim() ?? '';
    if (given === '') {
      throwIfProblems([{ field: 'confirm', message: `removing ${impact.item} archives ${loses}: type the trial code ${trialCode} to confirm` }]);
    } else if (given.toUpperCase() !== trialCode.toUpperCase()) {
      throwIfProblems([{ field: 'confirm', message: `“${given.slice(0, 40)}” is not the trial code: type ${trialCode} to confirm removing ${impact.item}, which archives ${loses}` }]);
    }
  }

  private async countBySite(trialId: number, target: RemovalTarget, transaction?: Transaction): Promise<RemovalImpactSite[]> {
    const column = target.kind === 'measure' ? 'o.measure_id' : 'o.round_id';
    const values = await this.sequelize.query<{ siteId: number; siteName: string; values: number; censored: number; missing: number; notes: number }>(
      `SELECT s.id AS siteId, s.name AS siteName, COUNT(*) AS \`values\`, SUM(o.censored) AS censored,
              SUM(o.missing_reason IS NOT NULL) AS missing, SUM(COALESCE(o.notes, '') <> '') AS notes
         FROM observations o
         JOIN plots p ON p.id = o.plot_id
         JOIN sites s ON s.id = p.site_id
         JOIN assessment_rounds r ON r.id = o.round_id AND r.deleted_at IS NULL
         JOIN measures m ON m.id = o.measure_id AND m.deleted_at IS NULL
        WHERE o.trial_id = :trialId AND ${column} = :id
        GROUP BY s.id, s.name`,
      { replacements: { trialId, id: target.id }, type: QueryTypes.SELECT, transaction },
    );
    const photos =
      target.kind === 'round'
        ? await this.sequelize.query<{ siteId: number; siteName: string; photos: number }>(
            `SELECT s.id AS siteId, s.name AS siteName, COUNT(*) AS photos
               FROM plot_photos ph JOIN plots p ON p.id = ph.plot_id JOIN sites s ON s.id = p.site_id
              WHERE ph.trial_id = :trialId AND ph.round_id = :id
              GROUP BY s.id, s.name`,
            { replacements: { trialId, id: target.id }, type: QueryTypes.SELECT, transaction },
          )
        : [];
    const bySite = new Map<number, RemovalImpactSite>();
    const site = (id: number, name: string) => {
      const known = bySite.get(id) ?? { siteId: id, siteName: name, values: 0, censored: 0, missing: 0, notes: 0, photos: 0 };
      bySite.set(id, known);
      return known;
    };
    for (const row of values) Object.assign(site(Number(row.siteId), row.siteName), { values: Number(row.values), censored: Number(row.censored), missing: Number(row.missing), notes: Number(row.notes) });
    for (const row of photos) site(Number(row.siteId), row.siteName).photos = Number(row.photos);
    return [...bySite.values()].sort((a, b) => a.siteId - b.siteId);
  }

  /** "Removes 240 recorded values and 12 notes of Drain time across 3 sites (30 censored and 12 missing with a reason). They are archived: …" */
  private summary(target: RemovalTarget, sites: RemovalImpactSite[], totals: Omit<RemovalImpactSite, 'siteId' | 'siteName'>): string {
    if (totals.values + totals.photos === 0) {
      return target.kind === 'measure'
        ? `Removes measure ${target.code} (${target.name}) from the protocol and from every round; no values are recorded for it.`
        : `Removes round ${target.label} from the protocol; no values or photos are recorded for it.`;
    }
    const subject = target.kind === 'measure' ? target.name : `round ${target.label}`;
    const kinds = [totals.censored ? `${totals.censored.toLocaleString('en-US')} censored` : '', totals.missing ? `${totals.missing.toLocaleString('en-US')} missing with a reason` : ''].filter(Boolean);
    const detail = kinds.length ? ` (${listInWords(kinds)})` : '';
    return `Removes ${lossInWords(totals)} of ${subject} ${whereInWords(sites)}${detail}. They are archived: kept on record, but no longer shown in the Ledger, Findings, exports or reports.`;
  }
}

/** "240 recorded values, 12 notes and 5 photos". */
export function lossInWords(totals: { values: number; notes: number; photos: number }): string {
  return listInWords(
    [
      totals.values ? count(totals.values, 'recorded value', 'recorded values') : '',
      totals.notes ? count(totals.notes, 'note', 'notes') : '',
      totals.photos ? count(totals.photos, 'photo', 'photos') : '',
    ].filter(Boolean),
  );
}

/** "at Hollow Lane", "across 3 sites". */
export function whereInWords(sites: ReadonlyArray<{ siteName: string }>): string {
  return sites.length === 1 ? `at ${sites[0]!.siteName}` : `across ${count(sites.length, 'site', 'sites')}`;
}
