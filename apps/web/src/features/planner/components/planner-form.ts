import { parseNumberFields } from '../../../components/field-errors';
import { ApiError } from '../../../lib/api-client';
import type { PlannerQuestion } from '../api/compute-power';

/** The Planner's boxes as typed. */
export interface PlannerForm {
  treatments: string;
  cv: string;
  difference: string;
  alpha: string;
  targetPower: string;
  sites: string;
}

export const initialPlannerForm: PlannerForm = { treatments: '5', cv: '15', difference: '20', alpha: '0.05', targetPower: '0.8', sites: '1' };

const labels: Record<keyof PlannerForm, string> = {
  treatments: 'Treatments',
  cv: 'CV',
  difference: 'Difference',
  alpha: 'Significance level',
  targetPower: 'Target power',
  sites: 'Sites',
};

/**
 * Reads the Planner's boxes into the question for POST /api/stats/power. A box left empty or not
 * holding a number gives an error shaped like the server's 422, so it shows beside its box; the
 * ranges themselves are the server's to check.
 */
export function plannerQuestionFrom(form: PlannerForm): { question: PlannerQuestion; targetPower: number } | { error: ApiError } {
  const { values, error } = parseNumberFields(form, labels);
  if (error) return { error };
  const empty = (Object.keys(values) as Array<keyof PlannerForm>).filter((key) => values[key] === null);
  if (empty.length) {
    return { error: new ApiError(422, 'Fill in every box to work out the blocks.', empty.map((field) => ({ field, message: `${labels[field]} is needed` }))) };
  }
  const v = values as Record<keyof PlannerForm, number>;
  return { question: { treatments: v.treatments, cv: v.cv, difference: v.difference, alpha: v.alpha, sites: v.sites }, targetPower: v.targetPower };
}
