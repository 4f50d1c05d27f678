import { describe, expect, it } from 'vitest';
import { varianceComponentsStructure } from './variance-components';

describe('varianceComponentsStructure', () => {
  const groups = Int32Array.of(0, 0, 0, 1, 1, 1);
  const wholePlot = Int32Array.of(0, 0, 1, 2, 2, 3);

  it('builds V_g = σ²_e I + σ²_w Z Z′ for each group', () => {
    const structure = varianceComponentsStructure([{ name: 'whole plot', codes: wholePlot }], groups);
    expect(structure.parameters.map((p) => p.name)).toEqual(['whole plot', 'residual']);
    const block = structure.block(0, Int32Array.of(0, 1, 2), Float64Array.of(2, 5));
    // Observations 0 and 1 share a whole plot: covariance 2; each has variance 5 + 2; observation 2 alone: 7.
    expect(Array.from(block.covariance)).toEqual([7, 2, 0, 2, 7, 0, 0, 0, 7]);
    expect(block.derivatives.map((d) => d.kind)).toEqual(['indicator', 'identity']);
  });

  it('refuses a random term whose level spans two independent groups', () => {
    expect(() => varianceComponentsStructure([{ name: 'treatment', codes: Int32Array.of(0, 1, 2, 0, 1, 2) }], groups)).toThrow(/random term crosses groups/);
  });

  it('refuses codes of the wrong length', () => {
    expect(() => varianceComponentsStructure([{ name: 'block', codes: Int32Array.of(0, 1) }], groups)).toThrow(/unequal lengths/);
  });
});
