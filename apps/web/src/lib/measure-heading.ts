import type { Measure } from '@friable/contracts';
import { findUnit } from '@friable/field';

/** A measure's column heading: its name with the unit symbol, "drain time (s)". */
export function measureHeading(measure: Pick<Measure, 'name' | 'unit'>): string {
  return `${measure.name} (${findUnit(measure.unit)?.symbol ?? measure.unit})`;
}
