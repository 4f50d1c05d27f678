import { describe, expect, it } from 'vitest';
import { gaussLegendreRule, integrateOverPanels, panelBreakpoints } from './quadrature';

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
