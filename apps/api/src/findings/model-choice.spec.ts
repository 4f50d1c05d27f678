import { describe, expect, it } from 'vitest';
import { chooseModel, defaultAnalysis, type ModelFacts } from './model-choice';

const facts = (over: Partial<ModelFacts>): ModelFacts => ({ measureName: 'water retained', kind: 'continuous', unit: 'mL', cutoff: null, rounds: [{ label: 'Day 0', dayOffset: 0 }], censoredCount: 0, ...over });
const rounds = (...days: number[]) => days.map((d) => ({ label: `Day ${d}`, dayOffset: d }));

describe('chooseModel', () => {
  it('makes each kind of measure its own model, and a number by its rounds', () => {
    expect(defaultAnalysis(facts({ kind: 'time-with-cutoff', cutoff: 600, rounds: rounds(0, 14) }))).toBe('censored');
    expect(defaultAnalysis(facts({ kind: 'score' }))).toBe('ordinal');
    expect(defaultAnalysis(facts({ kind: 'count' }))).toBe('counts');
    expect(defaultAnalysis(facts({ rounds: rounds(0) }))).toBe('anova');
    expect(defaultAnalysis(facts({ rounds: rounds(0, 14) }))).toBe('ancova');
    expect(defaultAnalysis(facts({ rounds: rounds(7, 14) }))).toBe('repeated');
    expect(defaultAnalysis(facts({ rounds: rounds(0, 14, 28) }))).toBe('repeated');
  });

  it('labels the ANOVA of a time with a cut-off as the biased fallback and says why the default was made', () => {
    const choice = chooseModel(facts({ measureName: 'drain time', kind: 'time-with-cutoff', unit: 's', cutoff: 600, rounds: rounds(0, 14), censoredCount: 3 }), 'anova');
    expect(choice.analysis).toBe('anova');
    expect(choice.defaultAnalysis).toBe('censored');
    expect(choice.options.find((o) => o.analysis === 'anova')).toEqual({
      analysis: 'anova',
      label: 'ANOVA on cut-off values (biased fallback)',
      available: true,
      isDefault: false,
      note: 'Biased: 3 plots not drained by the cut-off enter at the cut-off value, which understates the time.',
    });
    expect(choice.why).toMatch(/^The classical ANOVA .* biased fallback\. The analysis made for this measure is not-drained curves and time ratios: drain time has a cut-off of 600 s/);
    expect(choice.options.filter((o) => !o.available).map((o) => [o.analysis, o.note])).toEqual([
      ['ordinal', 'Only for a score measure.'],
      ['counts', 'Only for a count measure.'],
    ]);
  });

  it('offers rounds over time and the baseline only with an earlier round', () => {
    const choice = chooseModel(facts({ rounds: rounds(0) }));
    expect(choice.options.filter((o) => o.available).map((o) => o.analysis)).toEqual(['anova']);
  });
});
