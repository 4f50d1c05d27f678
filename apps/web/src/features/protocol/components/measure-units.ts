import { MEASURE_UNITS, type MeasureUnit } from '@friable/field';

/** The fixed measure units grouped by what they measure, for a select with option groups. */
export const measureUnitGroups: Array<{ dimension: string; units: MeasureUnit[] }> = MEASURE_UNITS.reduce<Array<{ dimension: string; units: MeasureUnit[] }>>((groups, unit) => {
  const group = groups.find((g) => g.dimension === unit.dimension);
  if (group) group.units.push(unit);
  else groups.push({ dimension: unit.dimension, units: [unit] });
  return groups;
}, []);

/** "kgf/cm2" → "kgf/cm²"; unknown ids are shown as they are. */
export function unitSymbol(id: string): string {
  return MEASURE_UNITS.find((unit) => unit.id === id)?.symbol ?? id;
}
