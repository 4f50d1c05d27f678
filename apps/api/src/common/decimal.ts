/** A DECIMAL column's value (MariaDB returns text) as a number; null stays null. */
export function decimalToNumber(value: string | number | null | undefined): number | null {
  if (value === null || value === undefined) return null;
  return typeof value === 'number' ? value : Number(value);
}
