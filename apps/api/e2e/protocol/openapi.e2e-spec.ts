import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOpenApiDocument } from '../../src/bootstrap';
import { createTestApp, type TestApp } from '../support/test-app';

describe('the OpenAPI page documents the protocol, sites and plot-plan routes', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(() => t.close());

  it('lists every route with its methods', async () => {
    // The document as /api/docs/openapi.json serves it when API_DOCS_PUBLIC=true (see the security headers spec).
    const response = { body: JSON.parse(JSON.stringify(createOpenApiDocument(t.app))) };
    const paths = response.body.paths as Record<string, Record<string, unknown>>;
    const methods = (path: string) => Object.keys(paths[path] ?? {}).sort();
    expect(methods('/api/trials/{trialId}')).toEqual(['get', 'patch']);
    expect(methods('/api/trials/{trialId}/factors')).toEqual(['get', 'put']);
    for (const feature of ['treatments', 'measures', 'rounds', 'sites']) {
      expect(methods(`/api/trials/{trialId}/${feature}`)).toEqual(['get', 'post']);
      expect(methods(`/api/trials/{trialId}/${feature}/{id}`)).toEqual(['delete', 'patch']);
    }
    expect(methods('/api/trials/{trialId}/sites/{siteId}/randomize')).toEqual(['post']);
    expect(methods('/api/trials/{trialId}/plots')).toEqual(['get']);
    expect(methods('/api/trials/{trialId}/sites/{siteId}/rounds/{roundId}/template.csv')).toEqual(['get']);
    expect(methods('/api/trials/{trialId}/amounts')).toEqual(['get']);
    expect(methods('/api/trials/{trialId}/activity')).toEqual(['get']);
    expect(methods('/api/rates/dose')).toEqual(['post']);
    const treatmentSchema = response.body.components.schemas.CreateTreatmentDto;
    expect(treatmentSchema.required).toEqual(['code', 'name']);
  });
});
