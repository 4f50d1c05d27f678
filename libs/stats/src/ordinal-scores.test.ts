import { describe, expect, it } from 'vitest';
import { analyseOrdinalScores, type ScoreObservation } from './ordinal-scores';

// Crumble scores (1–5) of an invented RCBD: 3 treatments × 8 blocks.
const scores: Record<string, number[]> = { CTRL: [2, 3, 3, 1, 2, 3, 4, 2], GYP: [2, 3, 4, 2, 3, 3, 3, 5], CMP: [4, 3, 5, 4, 2, 5, 4, 3] };
const observations: ScoreObservation[] = Object.entries(scores).flatMap(([treatment, values]) => values.map((value, b) => ({ treatment, block: String(b + 1), value })));

describe('analyseOrdinalScores', () => {
  it('tests treatment by likelihood ratio, gives odds ratios against the control and the shares per score', () => {
    const result = analyseOrdinalScores({ design: 'rcbd', control: 'CTRL', observations });
    expect(result.categories).toEqual(['1', '2', '3', '4', '5']);
    expect(result.tests.map((t) => [t.term, t.df])).toEqual([
      ['block', 7],
      ['treatment', 2],
    ]);
    expect(result.tests[1]!.p).toBeLessThan(0.01);
    expect(result.oddsRatios.map((o) => o.treatment)).toEqual(['GYP', 'CMP']);
    expect(result.oddsRatios[1]!.ratio).toBeGreaterThan(result.oddsRatios[0]!.ratio);
    expect(result.thresholds.map((t) => t.between)).toEqual(['1|2', '2|3', '3|4', '4|5']);
    for (const treatment of ['CTRL', 'GYP', 'CMP']) {
      const shares = result.probabilities.filter((p) => p.treatment === treatment);
      expect(shares).toHaveLength(5);
      expect(shares.reduce((sum, p) => sum + p.probability, 0)).toBeCloseTo(1, 12);
    }
    // The rank test stays beside the model: Friedman over the 8 blocks (2 df).
    expect(result.rankTest).toMatchObject({ test: 'friedman', df: 2 });
    expect(result.adjustment).toMatch(/single-step/);
  });

  it('refuses a score that is not a number and a single score, in words', () => {
    expect(() => analyseOrdinalScores({ design: 'crd', observations: [{ treatment: 'A', value: 'good' }, { treatment: 'B', value: 2 }] })).toThrow(/row 1 of the observations: the score must be a number, got good/);
    expect(() => analyseOrdinalScores({ design: 'crd', observations: [{ treatment: 'A', value: 2 }, { treatment: 'B', value: 2 }] })).toThrow(/every plot has the same score \(2\)/);
  });

  it('warns when a treatment holds only the top score (no finite odds ratio)', () => {
    const separated = observations.map((o) => (o.treatment === 'CMP' ? { ...o, value: 5 } : o));
    const result = analyseOrdinalScores({ design: 'rcbd', observations: separated });
    expect(result.warnings.join(' ')).toMatch(/Some estimates run away \(.*treatment CMP\)/);
    expect(result.oddsRatios.map((o) => o.treatment)).toEqual(['GYP']);
    expect(result.tests.find((t) => t.term === 'treatment')!.p).toBeLessThan(0.001);
  });
});
