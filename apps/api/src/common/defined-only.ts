/**
 * The fields a request actually sent. Validated DTO instances carry every declared property,
 * unset ones as undefined; a partial update must touch only the fields that were sent.
 */
export function definedOnly<T extends object>(input: T): Partial<T> {
  return Object.fromEntries(Object.entries(input).filter(([, value]) => value !== undefined)) as Partial<T>;
}
