import type { Transaction, WhereOptions } from 'sequelize';
import type { FieldProblem } from './exceptions/field-problems.exception';

interface TrialScopedModel {
  findOne(options: { where: WhereOptions; transaction?: Transaction }): Promise<{ id: number } | null>;
}

/**
 * Taken in trial — the 422 problem for a value another row of the same trial already uses
 * (a treatment or measure code, a round label, a site name or prefix), or null.
 * Example: `await takenInTrial(TreatmentRow, 7, 'code', 'G', null, t, 'treatment')` →
 * `{ field: 'code', message: 'code G is already used by another treatment of this trial' }`
 */
export async function takenInTrial(
  model: TrialScopedModel,
  trialId: number,
  field: string,
  value: string,
  exceptId: number | null,
  transaction: Transaction,
  thing: string,
): Promise<FieldProblem | null> {
  const other = await model.findOne({ where: { trialId, [field]: value }, transaction });
  return other && other.id !== exceptId ? { field, message: `${field} ${value} is already used by another ${thing} of this trial` } : null;
}
