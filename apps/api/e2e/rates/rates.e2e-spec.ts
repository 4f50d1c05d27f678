import type { DoseAnswer } from '@friable/contracts';
import { computeDose } from '@friable/field';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, createPerson, createTestApp, tokenFor, type TestApp } from '../support/test-app';
import { expectStatus } from '../protocol/protocol-builder';
import { fieldWords } from '../../src/common/input/field-words';

// Expected values are the worked examples of /work/shared/DOMAIN.md ("Rate arithmetic the Rate calculator
// must do"), computed there from the NIST SP 811 exact factors; compared to the decimals printed there.
describe('POST /api/rates/dose', () => {
  let t: TestApp;
  let auth: { Authorization: string };
  const dose = (body: object) => expectStatus<DoseAnswer>(t.http.post('/api/rates/dose').set(auth).send(body), 200);

  beforeAll(async () => {
    t = await createTestApp();
    auth = bearer(await tokenFor(t, await createPerson()));
  });
  afterAll(() => t.close());

  it('40 lb/1000 ft² of gypsum is 195.3 g/m², 13.8 g for a 30 cm pot (DOMAIN.md worked example, 1 decimal)', async () => {
    const answer = await dose({ rate: 40, unit: 'lb/1000ft2', basis: 'area', diameterCm: 30, materialKind: 'gypsum' });
    expect(answer.ratePerM2.unit).toBe('g/m2');
    expect(answer.ratePerM2.value).toBeCloseTo(195.3, 1);
    expect(answer.grams).toBeCloseTo(13.8, 1);
    expect(answer.kilograms).toBeCloseTo(0.0138, 4);
    expect(answer.litres).toBeNull();
    expect(answer.warnings).toEqual([]);
    expect(answer).toEqual({ ...computeDose({ rate: 40, unit: 'lb/1000ft2', basis: 'area', geometry: { diameterCm: 30 }, materialKind: 'gypsum' }) });
  });

  it('a 16 ft² plot at 40 lb/1000 ft² takes 0.64 lb = 290 g (DOMAIN.md, 2 decimals of lb, whole grams)', async () => {
    const answer = await dose({ rate: 40, unit: 'lb/1000ft2', basis: 'area', areaM2: 16 * 0.09290304 });
    expect(answer.pounds).toBeCloseTo(0.64, 10);
    expect(Math.round(answer.grams as number)).toBe(290);
    expect(answer.ounces).toBeCloseTo(10.24, 10);
  });

  it('2 short tons/acre on a 1.2 m × 1.2 m plot is 646 g (DOMAIN.md, whole grams)', async () => {
    const answer = await dose({ rate: 2, unit: 'ton/acre', basis: 'area', lengthM: 1.2, widthM: 1.2 });
    expect(answer.ratePerM2.value).toBeCloseTo(448.3, 1);
    expect(Math.round(answer.grams as number)).toBe(646);
  });

  it('"5 lb per 100 ft²" is 244 g/m² (DOMAIN.md, the 100 vs 1000 trap)', async () => {
    const answer = await dose({ rate: 5, unit: 'lb/100ft2', basis: 'area', areaM2: 1 });
    expect(Math.round(answer.ratePerM2.value)).toBe(244);
  });

  it('a 2 in compost layer over 1,000 ft² is 6.17 yd³, given in litres and gallons (DOMAIN.md, 2 decimals)', async () => {
    const answer = await dose({ rate: 2, unit: 'in', basis: 'area', areaM2: 1000 * 0.09290304 });
    expect(answer.grams).toBeNull();
    expect((answer.litres as number) / 764.554857984).toBeCloseTo(6.17, 2);
    expect(answer.gallons).toBeCloseTo((answer.litres as number) / 3.785411784, 10);
  });

  it('a rate per soil volume: rate ÷ depth × soil volume (DOMAIN.md formula; 195.297 g/m² ÷ 0.15 m × 0.010 m³ = 13.02 g)', async () => {
    const answer = await dose({ rate: 40, unit: 'lb/1000ft2', basis: 'concentration', diameterCm: 30, depthCm: 15, soilVolumeL: 10 });
    expect(answer.basis).toBe('concentration');
    expect(answer.grams).toBeCloseTo(13.02, 2);
  });

  it('adds the total for several plots with the margin (trialTotal doc example: 13.8 g × 12 × 1.1 = 182.16 g)', async () => {
    const answer = await dose({ rate: 40, unit: 'lb/1000ft2', basis: 'area', diameterCm: 30, plots: 12, marginPercent: 10 });
    expect(answer.total?.grams).toBeCloseTo((answer.grams as number) * 12 * 1.1, 10);
    expect(answer.total?.grams).toBeCloseTo(182.2, 0);
    const compost = await dose({ rate: 1, unit: 'in', basis: 'area', lengthM: 1, widthM: 1, plots: 4 });
    // 1 in over 1 m² = 25.4 L (1 in = 2.54 cm; 1 cm over 1 m² = 10 L), × 4 plots.
    expect(compost.total?.litres).toBeCloseTo(101.6, 10);
    expect(compost.total?.grams).toBeNull();
  });

  it('warns about a gypsum rate far above the usual range but still answers', async () => {
    const answer = await dose({ rate: 400, unit: 'lb/1000ft2', basis: 'area', diameterCm: 30, materialKind: 'gypsum' });
    expect(answer.warnings.length).toBeGreaterThan(0);
  });

  it.each([
    [{ rate: 40, unit: 'lb/1000ft2', basis: 'area' }, 'areaM2'],
    [{ rate: 40, unit: 'lb/1000ft2', basis: 'area', diameterCm: 30, areaM2: 1 }, 'areaM2'],
    [{ rate: 40, unit: 'lb/1000ft2', basis: 'area', diameterCm: -3 }, 'diameterCm'],
    [{ rate: 40, unit: 'lb/1000ft2', basis: 'concentration', diameterCm: 30, depthCm: 15 }, 'soilVolumeL'],
    [{ rate: 40, unit: 'lb/1000ft2', basis: 'concentration', diameterCm: 30, soilVolumeL: 10 }, 'depthCm'],
    [{ rate: 1, unit: 'in', basis: 'area', diameterCm: 30, purity: 0.5 }, 'purity'],
    [{ rate: 40, unit: 'furlong', basis: 'area', diameterCm: 30 }, 'unit'],
    [{ rate: -1, unit: 'g/m2', basis: 'area', diameterCm: 30 }, 'rate'],
  ])('answers 422 naming the field for %j', async (body, field) => {
    const response = await t.http.post('/api/rates/dose').set(auth).send(body);
    expect(response.status).toBe(422);
    expect(response.body.errors[0].field).toBe(field);
    // The message names the field as people read it ("area (m²)", "diameter (cm)"), the key stays in `field`.
    expect(response.body.errors[0].message.startsWith(fieldWords(field))).toBe(true);
  });
});
