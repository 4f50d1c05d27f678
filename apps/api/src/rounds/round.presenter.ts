import type { AssessmentRound } from '@friable/contracts';
import type { AssessmentRoundRow } from './models/assessment-round.model';

/** startDate (YYYY-MM-DD) plus a number of days, as YYYY-MM-DD; null without a start date. */
export function dueDate(startDate: string | null, dayOffset: number): string | null {
  if (!startDate) return null;
  const date = new Date(`${startDate}T00:00:00Z`);
  date.setUTCDate(date.getUTCDate() + dayOffset);
  return date.toISOString().slice(0, 10);
}

/** A round row (with its measures loaded) as the API answers it. */
export function presentRound(row: AssessmentRoundRow, startDate: string | null): AssessmentRound {
  return {
    id: row.id,
    version: row.version,
    label: row.label,
    dayOffset: row.dayOffset,
    dueDate: dueDate(startDate, row.dayOffset),
    measureIds: (row.measures ?? []).map((m) => m.id).sort((a, b) => a - b),
  };
}
