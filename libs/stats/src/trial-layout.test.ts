import { describe, expect, it } from 'vitest';
import { codeFactor, prepareTrialLayout } from './trial-layout';

describe('prepareTrialLayout', () => {
  it('codes labels in order of first appearance', () => {
    const factor = codeFactor('treatment', ['b', 'a', 'b', 'c']);
    expect(factor.levels).toEqual(['b', 'a', 'c']);
    expect(Array.from(factor.codes)).toEqual([0, 1, 0, 2]);
  });

  it('nests blocks in sites and centres values exactly', () => {
    const observations = ['S1', 'S2'].flatMap((site) =>
      ['1', '2'].flatMap((block) => ['a', 'b'].map((treatment) => ({ treatment, block, site, value: '1000000000000.4' }))),
    );
    const { layout, centreValue } = prepareTrialLayout('multisite-rcbd', observations, observations.map((o) => o.value));
    expect(layout.block!.levels).toHaveLength(4);
    expect(Array.from(layout.y)).toEqual(new Array(8).fill(0));
    expect(centreValue).toBe(1000000000000.4);
  });

  it('builds factorial combinations a × b with every combination present', () => {
    const observations = ['x', 'y'].flatMap((a) => ['1', '2'].map((b) => ({ factors: { A: a, B: b }, block: '1', value: 1 })));
    const { layout } = prepareTrialLayout('factorial-rcbd', observations, observations.map((o) => o.value), ['A', 'B']);
    expect(layout.treatment.levels).toEqual(['x × 1', 'x × 2', 'y × 1', 'y × 2']);
  });

  it('refuses a treatment missing from one site and too few sites', () => {
    const rows = [
      { treatment: 'a', block: '1', site: 'S1', value: 1 },
      { treatment: 'b', block: '1', site: 'S1', value: 2 },
      { treatment: 'a', block: '1', site: 'S2', value: 3 },
      { treatment: 'a', block: '1', site: 'S2', value: 4 },
    ];
    expect(() => prepareTrialLayout('multisite-rcbd', rows, rows.map((r) => r.value))).toThrow(/treatment b has no observations at site S2/);
    const oneSite = rows.slice(0, 2);
    expect(() => prepareTrialLayout('multisite-rcbd', oneSite, oneSite.map((r) => r.value))).toThrow(/at least two sites/);
  });
});
