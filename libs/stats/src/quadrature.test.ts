import { describe, expect, it } from 'vitest';
import { gaussLegendreRule, integrateOverPanels, panelBreakpoints } from './quadrature';
import { findIncreasingRoot, findRoot } from './root-finding';
import { expectOverScaledChi } from './scaled-chi';

describe('gaussLegendreRule', () => {
  it('has the textbook 2- and 3-point nodes and weights', () => {
    // Abramowitz & Stegun 25.4.29 / Table 25.4: ±1/sqrt(3) weight 1; 0 and ±sqrt(3/5), weights 8/9 and 5/9.
    const two = gaussLegendreRule(2);
    expect(two.nodes[1]).toBeCloseTo(1 / Math.sqrt(3), 15);
    expect(two.weights[0]).toBeCloseTo(1, 15);
    const three = gaussLegendreRule(3);
    expect(three.nodes[1]).toBeCloseTo(0, 15);
    expect(three.nodes[2]).toBeCloseTo(Math.sqrt(3 / 5), 15);
    expect(three.weights[1]).toBeCloseTo(8 / 9, 15);
    expect(three.weights[0]).toBeCloseTo(5 / 9, 15);
  });

  it('integrates polynomials of degree 2n-1 exactly (weights sum to 2)', () => {
    const { nodes, weights } = gaussLegendreRule(12);
    const integral = nodes.reduce((sum, x, i) => sum + weights[i] * x ** 22, 0);
    expect(integral).toBeCloseTo(2 / 23, 14); // ∫_{-1}^{1} x^22 dx = 2/23
    expect(weights.reduce((a, b) => a + b, 0)).toBeCloseTo(2, 14);
  });

  it('rejects a non-integer order', () => {
    expect(() => gaussLegendreRule(2.5)).toThrow(RangeError);
  });
});

describe('integrateOverPanels', () => {
  it('integrates exp over [0, 1] to e - 1', () => {
    expect(integrateOverPanels(Math.exp, [0, 1], 1e-13)).toBeCloseTo(Math.E - 1, 13);
  });

  it('refines a narrow peak to the requested accuracy', () => {
    // ∫ exp(-x²/(2·0.01²)) dx over [-1, 1] = 0.01·sqrt(2π) (tails beyond 100 sd are below 1e-300).
    const peak = (x: number) => Math.exp(-(x * x) / 2e-4);
    expect(integrateOverPanels(peak, panelBreakpoints(-1, 1, 4), 1e-13)).toBeCloseTo(0.01 * Math.sqrt(2 * Math.PI), 12);
  });

  it('rejects decreasing breakpoints', () => {
    expect(() => integrateOverPanels(Math.exp, [1, 0], 1e-9)).toThrow(RangeError);
  });
});

describe('findRoot', () => {
  it('finds sqrt(2) and cos(x) = x', () => {
    expect(findRoot((x) => x * x - 2, 0, 2, 1e-14)).toBeCloseTo(Math.SQRT2, 13);
    expect(findRoot((x) => Math.cos(x) - x, 0, 1, 1e-14)).toBeCloseTo(0.7390851332151607, 13); // Dottie number
  });

  it('widens a bracket that misses the root of an increasing function', () => {
    expect(findIncreasingRoot((x) => x * x * x - 27, 0.5, 1, 1e-13)).toBeCloseTo(3, 12);
    expect(findIncreasingRoot((x) => x - 0.01, 1, 2, 1e-14)).toBeCloseTo(0.01, 13);
  });

  it('rejects an interval without a sign change', () => {
    expect(() => findRoot((x) => x * x + 1, -1, 1, 1e-9)).toThrow(RangeError);
  });
});

describe('expectOverScaledChi', () => {
  it('integrates the density of S to 1 and gives E[S²] = 1', () => {
    for (const df of [1, 2, 5, 30, 1000, 1e6]) {
      expect(expectOverScaledChi(() => 1, df, 1, 1e-13)).toBeCloseTo(1, 11);
      expect(expectOverScaledChi((s) => s * s, df, 1, 1e-13)).toBeCloseTo(1, 11);
    }
  });

  it('gives the t distribution: E[Φ(c S)] = P(T ≤ c)', async () => {
    const { jStat } = await import('jstat');
    // Student's t with 4 df: P(T ≤ 2) = 0.9419417, R 4.2.2: pt(2, 4) = 0.941941738242.
    const value = expectOverScaledChi((s) => jStat.normal.cdf(2 * s, 0, 1), 4, 2, 1e-13);
    expect(value).toBeCloseTo(0.9419417382, 9);
  });

  it('reduces to g(1) for infinite df', () => {
    expect(expectOverScaledChi((s) => s + 1, Infinity, 1, 1e-9)).toBe(2);
  });
});
