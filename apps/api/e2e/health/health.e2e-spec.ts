import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../support/test-app';

describe('health', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('reports the API and the database as up, without a token', async () => {
    const response = await t.http.get('/api/health');
    expect(response.status).toBe(200);
    expect(response.body).toEqual({ status: 'ok', database: 'up' });
  });
  // The database stopped or frozen (503 with Retry-After, and back without a restart): e2e/hardening/database-down.e2e-spec.ts.
});
