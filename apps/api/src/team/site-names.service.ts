import { Injectable } from '@nestjs/common';
import { InjectConnection } from '@nestjs/sequelize';
import { QueryTypes, type Transaction } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';

/** Reads site names for the Team pages straight from the sites table (the protocol feature owns it). */
@Injectable()
export class SiteNamesService {
  constructor(@InjectConnection() private readonly sequelize: Sequelize) {}

  /** id → name of every site of the trial. */
  async forTrial(trialId: number, transaction?: Transaction): Promise<Map<number, string>> {
    const rows = await this.sequelize.query<{ id: number; name: string }>('SELECT id, name FROM sites WHERE trial_id = ?', {
      replacements: [trialId],
      type: QueryTypes.SELECT,
      transaction,
    });
    return new Map(rows.map((r) => [Number(r.id), r.name]));
  }
}
