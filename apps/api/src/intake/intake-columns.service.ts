import type { IntakeColumnChoice } from '@friable/contracts';
import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import { IntakeColumnChoiceRow } from './models/intake-column-choice.model';

/** Most headers remembered per trial (the oldest choices give way). */
const MAX_REMEMBERED = 500;

/**
 * Intake columns — remembers, per trial, what uploads read their own column headers as where a
 * person chose it in the mapping step, so the next file with those headers needs no mapping.
 *
 * Purpose: a collaborator whose sheet says "Parcel" and "secs to drain" maps them once. Only
 * choices that differ from the automatic matching are kept; a header that now matches by itself
 * is forgotten. Stored within the commit's transaction: an upload that is not saved teaches nothing.
 * Throws: nothing of its own.
 */
@Injectable()
export class IntakeColumnsService {
  constructor(@InjectModel(IntakeColumnChoiceRow) private readonly choices: typeof IntakeColumnChoiceRow) {}

  async list(trialId: number): Promise<IntakeColumnChoice[]> {
    const rows = await this.choices.findAll({ where: { trialId }, order: [['header', 'ASC']] });
    return rows.map((row) => ({ header: row.header, choice: row.choice }));
  }

  /** header → choice, for `mapColumns`. */
  async remembered(trialId: number): Promise<Record<string, string | null>> {
    return Object.fromEntries((await this.list(trialId)).map((row) => [row.header, row.choice]));
  }

  async remember(
    transaction: Transaction,
    trialId: number,
    userId: number | null,
    chosen: Readonly<Record<string, string | null>>,
    automatic: Readonly<Record<string, string | null>>,
  ): Promise<void> {
    const headers = Object.keys(chosen).filter((header) => header.length <= 255);
    const differing = headers.filter((header) => chosen[header] !== (automatic[header] ?? null));
    const matching = headers.filter((header) => chosen[header] === (automatic[header] ?? null));
    if (matching.length) await this.choices.destroy({ where: { trialId, header: matching }, transaction });
    for (const header of differing) {
      await this.choices.upsert({ trialId, header, choice: chosen[header] ?? null, updatedBy: userId }, { transaction });
    }
    const count = await this.choices.count({ where: { trialId }, transaction });
    if (count > MAX_REMEMBERED) {
      const oldest = await this.choices.findAll({ where: { trialId }, order: [['updatedAt', 'ASC']], limit: count - MAX_REMEMBERED, transaction });
      await this.choices.destroy({ where: { id: oldest.map((row) => row.id) }, transaction });
    }
  }

  async forget(transaction: Transaction, trialId: number): Promise<number> {
    return this.choices.destroy({ where: { trialId }, transaction });
  }
}
