import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../support/test-app';
import { buildIntakeTrial, intakePath, rowCounts, upload, type IntakeTrial } from './intake-support';

// The browser's mapping step sends its column choices as the `mapping` form field.
describe('Intake: the column mapping chosen in the upload step', () => {
  let t: TestApp;
  let built: IntakeTrial;
  const ownHeaders = Buffer.from('Parcel,secs to drain,comments\nTG-B1-P01,42,mapped by hand\n');

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildIntakeTrial(t);
  });
  afterAll(() => t.close());

  it('cannot read a file with its own headers without a mapping', async () => {
    const response = await upload(t, built.tokens.investigator, `${intakePath(built)}?dryRun=true`, ownHeaders);
    expect(response.status).toBe(422);
    expect(JSON.stringify(response.body.errors)).toMatch(/no plot label column/);
  });

  it('reads it with the mapping: headers to plot label, a measure code and notes', async () => {
    const mapping = JSON.stringify({ Parcel: 'plotLabel', 'secs to drain': 'DT', comments: 'notes' });
    const response = await upload(t, built.tokens.investigator, `${intakePath(built)}?dryRun=true`, ownHeaders, 'own.csv', { mapping });
    expect(response.status).toBe(200);
    expect(response.body.dryRun).toBe(true);
    expect(response.body.changes).toContainEqual(expect.objectContaining({ plotLabel: 'TG-B1-P01', measureCode: 'DT', kind: 'new', after: '42' }));
  });

  it('refuses a mapping that is not JSON, naming the field, and writes nothing', async () => {
    const before = await rowCounts(t.sequelize, built.trialId);
    const response = await upload(t, built.tokens.investigator, intakePath(built), ownHeaders, 'own.csv', { mapping: '{Parcel: plotLabel' });
    expect(response.status).toBe(422);
    expect(response.body.errors).toEqual([
      { field: 'mapping', message: 'mapping must be JSON: an object from column header to plot label, block, treatment, notes, reason the value is missing, a measure code, or null' },
    ]);
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
  });

  it('refuses a mapping to a measure the round does not take', async () => {
    const mapping = JSON.stringify({ Parcel: 'plotLabel', 'secs to drain': 'NOPE' });
    const response = await upload(t, built.tokens.investigator, `${intakePath(built)}?dryRun=true`, ownHeaders, 'own.csv', { mapping });
    expect(response.status).toBe(422);
    expect(response.body.errors.some((e: { column: string }) => e.column === 'secs to drain')).toBe(true);
  });
});
