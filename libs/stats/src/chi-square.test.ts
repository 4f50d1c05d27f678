import { describe, expect, it } from 'vitest';
import { chiSquareUpperTail } from './chi-square';
import { relativeError } from './test-support/reference-files';

describe('chiSquareUpperTail', () => {
  it('matches R pchisq(..., lower.tail = FALSE) to 1e-12 relative', () => {
    // R 4.2.2: pchisq(c(78/7, 28.710448, 0.5, 300), c(2, 6, 1, 10), lower.tail = FALSE)
    // = 0.00380504077551136 6.90121849333054e-05 0.479500122186953 1.55467475438032e-58
    expect(relativeError(chiSquareUpperTail(78 / 7, 2), 0.00380504077551136)).toBeLessThan(1e-12);
    expect(relativeError(chiSquareUpperTail(28.710448, 6), 6.90121849333054e-5)).toBeLessThan(1e-12);
    expect(relativeError(chiSquareUpperTail(0.5, 1), 0.479500122186953)).toBeLessThan(1e-12);
    expect(relativeError(chiSquareUpperTail(300, 10), 1.55467475438032e-58)).toBeLessThan(1e-10);
  });

  it('is 1 at 0 and NaN for df ≤ 0', () => {
    expect(chiSquareUpperTail(0, 3)).toBe(1);
    expect(chiSquareUpperTail(1, 0)).toBeNaN();
  });
});
