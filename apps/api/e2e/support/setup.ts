import { afterAll, expect } from 'vitest';
import { contractViolations } from './response-contract';

// Each test file ends by checking that every answer it received matched the API's documented schema.
afterAll(() => {
  expect(contractViolations, 'answers that do not match their OpenAPI schema').toEqual([]);
});
