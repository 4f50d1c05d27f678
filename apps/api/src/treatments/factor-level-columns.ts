import type { TreatmentRow } from './models/treatment.model';

type LevelColumns = Pick<TreatmentRow, 'factorLevelAId' | 'factorLevelBId' | 'factorLevelCId' | 'factorLevelDId'>;

/** A combination's level ids (factor order) as the treatment row's four level columns. */
export function levelIdColumns(ids: readonly number[]): LevelColumns {
  return { factorLevelAId: ids[0] ?? null, factorLevelBId: ids[1] ?? null, factorLevelCId: ids[2] ?? null, factorLevelDId: ids[3] ?? null };
}

/** The treatment row's level ids in factor order, without the empty columns. */
export function levelIdsOf(row: LevelColumns): number[] {
  return [row.factorLevelAId, row.factorLevelBId, row.factorLevelCId, row.factorLevelDId].filter((id): id is number => id !== null && id !== undefined);
}
