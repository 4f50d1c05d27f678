import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../support/test-app';
import { buildIntakeTrial, intakePath, rowCounts, storedValues, upload, type IntakeTrial } from './intake-support';

/** A reason chosen for the whole file in the upload dialog covers the NA values of rows that give none. */
describe('Intake: one missing reason for the whole file', () => {
  let t: TestApp;
  let built: IntakeTrial;

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildIntakeTrial(t);
  });
  afterAll(() => t.close());

  const reasons = async () =>
    Object.fromEntries((await storedValues(t.sequelize, built.trialId)).filter((v) => v.measure === 'DT').map((v) => [v.plot, [v.valueText, v.missingReason]]));

  it('refuses NA without a reason as before, and takes the file’s reason when one is chosen', async () => {
    const csv = Buffer.from('plot label,drain time (s)\nTG-B1-P01,120\nTG-B1-P02,NA\nTG-B1-P03,NA\n');
    const before = await rowCounts(t.sequelize, built.trialId);
    const refused = await upload(t, built.tokens.collaborator, intakePath(built), csv, 'no-reasons.csv');
    expect(refused.status).toBe(422);
    expect(refused.body.errors.map((e: { message: string }) => e.message)).toContain('Row 3, drain time (s): drain time is NA (missing) without a reason: add a “missing reason” column saying why (for example “bed flooded”).');
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);

    const saved = await upload(t, built.tokens.collaborator, intakePath(built), csv, 'no-reasons.csv', { missingReason: '  not measured on the day ' });
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    expect(await reasons()).toEqual({ 'TG-B1-P01': ['120', null], 'TG-B1-P02': [null, 'not measured on the day'], 'TG-B1-P03': [null, 'not measured on the day'] });
  });

  it('lets a row’s own reason come first, the file’s reason filling only the empty cells', async () => {
    const csv = Buffer.from('plot label,drain time (s),missing reason\nTG-B1-P01,NA,plot flooded\nTG-B1-P02,NA,\nTG-B1-P03,95,\n');
    const saved = await upload(t, built.tokens.collaborator, intakePath(built), csv, 'some-reasons.csv', { missingReason: 'equipment failed' });
    expect(saved.status, JSON.stringify(saved.body)).toBe(200);
    expect(await reasons()).toEqual({ 'TG-B1-P01': [null, 'plot flooded'], 'TG-B1-P02': [null, 'equipment failed'], 'TG-B1-P03': ['95', null] });
  });

  it('refuses a reason for the file longer than the column holds, in words', async () => {
    const response = await upload(t, built.tokens.collaborator, intakePath(built), Buffer.from('plot label,drain time (s)\nTG-B1-P01,NA\n'), 'long.csv', { missingReason: 'x'.repeat(201) });
    expect(response.status).toBe(422);
    expect(response.body.message).toContain('the missing reason for the file must be at most 200 characters');
  });
});
