// Input checks shared by the field functions. Every bad input becomes a RangeError with
// one message pattern: "<function>: <field> must be <requirement> (got <value>)".

function describeValue(value: unknown): string {
  if (typeof value === 'string') return JSON.stringify(value);
  if (value === undefined) return 'nothing';
  if (typeof value === 'number' || typeof value === 'boolean' || value === null) return String(value);
  return JSON.stringify(value) ?? String(value);
}

export function invalidInput(
  functionName: string,
  field: string,
  requirement: string,
  got: unknown,
): RangeError {
  return new RangeError(`${functionName}: ${field} must be ${requirement} (got ${describeValue(got)})`);
}

export function requirePositive(functionName: string, field: string, value: unknown): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
    throw invalidInput(functionName, field, 'a finite number above 0', value);
  }
  return value;
}

export function requireNonNegative(functionName: string, field: string, value: unknown): number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0) {
    throw invalidInput(functionName, field, 'a finite number of at least 0', value);
  }
  return value;
}

export function requirePositiveInteger(functionName: string, field: string, value: unknown): number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < 1) {
    throw invalidInput(functionName, field, 'a whole number of at least 1', value);
  }
  return value;
}

export function requireText(functionName: string, field: string, value: unknown): string {
  if (typeof value !== 'string' || value.trim() === '') {
    throw invalidInput(functionName, field, 'a non-empty text', value);
  }
  return value;
}
