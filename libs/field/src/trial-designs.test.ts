import { describe, expect, it } from 'vitest';
import { factorCombinations } from './factor-combinations';
import { DESIGN_RULES, TRIAL_DESIGNS, appliedUnit, isFactorDesign, plotsPerAppliedUnit, requireTrialDesign } from './trial-designs';

describe('trial designs', () => {
  it('lists one-factor, factorial and split designs with the factors each takes', () => {
    expect(TRIAL_DESIGNS).toEqual(['crd', 'rcbd', 'factorial-crd', 'factorial-rcbd', 'split-plot', 'split-split-plot']);
    expect(TRIAL_DESIGNS.map((d) => [d, DESIGN_RULES[d].minFactors, DESIGN_RULES[d].maxFactors, DESIGN_RULES[d].blocked])).toEqual([
      ['crd', 0, 0, false],
      ['rcbd', 0, 0, true],
      ['factorial-crd', 2, 4, false],
      ['factorial-rcbd', 2, 4, true],
      ['split-plot', 2, 2, true],
      ['split-split-plot', 3, 3, true],
    ]);
    expect(TRIAL_DESIGNS.filter(isFactorDesign)).toEqual(['factorial-crd', 'factorial-rcbd', 'split-plot', 'split-split-plot']);
    expect(() => requireTrialDesign('f', 'latin-square')).toThrow(/f: design must be one of "crd", "rcbd"/);
  });

  it('applies a split plot\'s factors to whole plots, sub plots and sub-sub plots; a factorial\'s to the plot', () => {
    expect([0, 1].map((i) => appliedUnit('split-plot', i))).toEqual(['whole plot', 'sub plot']);
    expect([0, 1, 2].map((i) => appliedUnit('split-split-plot', i))).toEqual(['whole plot', 'sub plot', 'sub-sub plot']);
    expect([0, 3].map((i) => appliedUnit('factorial-rcbd', i))).toEqual(['plot', 'plot']);
    expect(appliedUnit('rcbd', 0)).toBe('plot');
    expect(() => appliedUnit('split-plot', 2)).toThrow(/appliedUnit: factorIndex must be a whole number from 0 to 1/);
  });

  it('counts the measured plots one unit of a factor covers (sub plots side by side in their whole plot)', () => {
    expect(plotsPerAppliedUnit('split-plot', [3, 4], 0)).toBe(4);
    expect(plotsPerAppliedUnit('split-plot', [3, 4], 1)).toBe(1);
    expect(plotsPerAppliedUnit('split-split-plot', [3, 4, 2], 0)).toBe(8);
    expect(plotsPerAppliedUnit('split-split-plot', [3, 4, 2], 1)).toBe(2);
    expect(plotsPerAppliedUnit('factorial-rcbd', [3, 4], 0)).toBe(1);
    expect(() => plotsPerAppliedUnit('split-plot', [3, 0], 0)).toThrow(/levelCounts\[1\]/);
  });
});

describe('factorCombinations', () => {
  const level = (code: string) => ({ code, name: `level ${code}` });

  it('crosses 2–4 factors with the first outermost, joining codes and names', () => {
    const two = factorCombinations([[level('W'), level('S')], [level('0'), level('5'), level('10')]]);
    expect(two.map((c) => c.code)).toEqual(['W0', 'W5', 'W10', 'S0', 'S5', 'S10']);
    expect(two[1]!.name).toBe('level W × level 5');
    expect(two[1]!.levels.map((l) => l.code)).toEqual(['W', '5']);
    const four = factorCombinations([[level('a'), level('b')], [level('1'), level('2')], [level('x'), level('y'), level('z')], [level('+'), level('-')]]);
    expect(four).toHaveLength(24);
    expect(four[0]!.code).toBe('a1x+');
    expect(four[23]!.code).toBe('b2z-');
    expect(Object.isFrozen(four) && Object.isFrozen(four[0])).toBe(true);
  });

  it('throws RangeError for no factors or a factor without levels', () => {
    expect(() => factorCombinations([])).toThrow(/factorCombinations: factors must be a list of at least 1 factor/);
    expect(() => factorCombinations([[level('a')], []])).toThrow(/factors\[1\] must be a list of at least 1 level/);
  });
});
