import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { compactLetterDisplay, letterLabel } from './compact-letters';

const shareLetter = (a: string, b: string) => [...a].some((letter) => b.includes(letter));

/** For display strings made of single letters (fewer than 53 columns). */
function expectInvariant(letters: Record<string, string>, differ: (a: string, b: string) => boolean) {
  const names = Object.keys(letters);
  for (const a of names) {
    expect(letters[a].length).toBeGreaterThan(0);
    for (const b of names) if (a < b) expect(shareLetter(letters[a], letters[b])).toBe(!differ(a, b));
  }
}

/** Pairs of treatments that share a letter in a published display (letters may be in any order). */
const sharedPairs = (display: Record<string, string>) =>
  Object.keys(display)
    .flatMap((a) => Object.keys(display).filter((b) => a < b && shareLetter(display[a], display[b])).map((b) => `${a}|${b}`))
    .sort();

describe('letterLabel', () => {
  it('runs a … z, A … Z, then aa, ab, …', () => {
    expect([0, 25, 26, 51, 52, 53, 103, 104].map(letterLabel)).toEqual(['a', 'z', 'A', 'Z', 'aa', 'ab', 'aZ', 'ba']);
  });
});

describe('compactLetterDisplay', () => {
  it('gives the highest mean "a": PlantGrowth Tukey (STATISTICS.md C.2 and H)', () => {
    // C.2 TukeyHSD p adj: trt1-ctrl 0.3908711, trt2-ctrl 0.1979960, trt2-trt1 0.0120064; means trt2 > ctrl > trt1.
    // H: with means sorted descending the display reads trt2 a, ctrl ab, trt1 b (multcomp in level order: ctrl ab, trt1 a, trt2 b).
    const p: Record<string, number> = { 'ctrl|trt1': 0.3908711, 'ctrl|trt2': 0.197996, 'trt1|trt2': 0.0120064 };
    const differ = (a: string, b: string) => p[[a, b].sort().join('|')] < 0.05;
    const letters = compactLetterDisplay(['trt2', 'ctrl', 'trt1'], differ);
    expect(letters).toEqual({ trt2: 'a', ctrl: 'ab', trt1: 'b' });
    expect(sharedPairs(letters)).toEqual(sharedPairs({ ctrl: 'ab', trt1: 'a', trt2: 'b' }));
  });

  it('reproduces the vascular graft Tukey and LSD displays (STATISTICS.md B.2)', () => {
    // B.2, computed (R 4.2.2): TukeyHSD p adj and unadjusted pairwise t p-values (15 df); means 8500 > 8700 > 8900 > 9100
    const tukey: Record<string, number> = {
      '8500|8700': 0.8854831, '8500|8900': 0.1013084, '8500|9100': 0.0020883,
      '8700|8900': 0.3245644, '8700|9100': 0.0086667, '8900|9100': 0.2257674,
    };
    const unadjusted: Record<string, number> = {
      '8500|8700': 0.47946, '8500|8900': 0.024713, '8500|9100': 0.00041369,
      '8700|8900': 0.096962, '8700|9100': 0.0017929, '8900|9100': 0.0621,
    };
    const order = ['8500', '8700', '8900', '9100'];
    const below = (p: Record<string, number>) => (a: string, b: string) => p[[a, b].sort().join('|')] < 0.05;
    // Tukey CLD: 8500 a, 8700 a, 8900 ab, 9100 b ; Fisher-LSD CLD: 8500 a, 8700 ab, 8900 bc, 9100 c
    expect(compactLetterDisplay(order, below(tukey))).toEqual({ '8500': 'a', '8700': 'a', '8900': 'ab', '9100': 'b' });
    expect(compactLetterDisplay(order, below(unadjusted))).toEqual({ '8500': 'a', '8700': 'ab', '8900': 'bc', '9100': 'c' });
  });

  it('reproduces the Snedecor beets Tukey and LSD displays from the HSD and LSD (STATISTICS.md B.7)', () => {
    // B.7, computed (R 4.2.2): means, HSD05 1.603817, LSD05 1.037629 (balanced, so |difference| > HSD is Tukey's test)
    const means: Record<string, number> = {
      None: 3.353333, P: 5.63, K: 3.563333, PK: 6.486667, PN: 7.08, KN: 3.538333, PKN: 7.353333,
    };
    const order = Object.keys(means).sort((a, b) => means[b] - means[a]);
    const beyond = (limit: number) => (a: string, b: string) => Math.abs(means[a] - means[b]) > limit;
    const tukey = compactLetterDisplay(order, beyond(1.603817));
    const lsd = compactLetterDisplay(order, beyond(1.037629));
    // multcomp::cld in level order: Tukey None a, P b, K a, PK bc, PN bc, KN a, PKN c; LSD None a, P b, K a, PK bc, PN c, KN a, PKN c
    expect(sharedPairs(tukey)).toEqual(sharedPairs({ None: 'a', P: 'b', K: 'a', PK: 'bc', PN: 'bc', KN: 'a', PKN: 'c' }));
    expect(sharedPairs(lsd)).toEqual(sharedPairs({ None: 'a', P: 'b', K: 'a', PK: 'bc', PN: 'c', KN: 'a', PKN: 'c' }));
    expect(tukey.PKN).toBe('a');
  });

  it('keeps the invariant for any significance pattern (property test)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 12 }).chain((count) =>
          fc.tuple(fc.constant(count), fc.array(fc.boolean(), { minLength: (count * (count - 1)) / 2, maxLength: (count * (count - 1)) / 2 })),
        ),
        ([count, pattern]) => {
          const names = Array.from({ length: count }, (_, i) => `t${String(i).padStart(2, '0')}`);
          const pairIndex = (i: number, j: number) => (j * (j - 1)) / 2 + i; // i < j
          const differ = (a: string, b: string) => {
            const [i, j] = [names.indexOf(a), names.indexOf(b)].sort((x, y) => x - y);
            return pattern[pairIndex(i, j)];
          };
          const letters = compactLetterDisplay(names, differ);
          expectInvariant(letters, differ);
          expect(letters[names[0]].startsWith('a')).toBe(true);
        },
      ),
      { numRuns: 400 },
    );
  });

  it('uses multi-character labels beyond 52 letters and keeps the invariant', () => {
    // 60 treatments, each different from every other: 60 columns, labels a … Z, aa … ah
    const names = Array.from({ length: 60 }, (_, i) => `t${i}`);
    const letters = compactLetterDisplay(names, () => true);
    expect(letters.t0).toBe('a');
    expect(letters.t51).toBe('Z');
    expect(letters.t52).toBe('aa');
    expect(letters.t59).toBe('ah');
    expect(new Set(Object.values(letters)).size).toBe(60);
  });

  it('gives every treatment "a" when none differ, and rejects a repeated name', () => {
    expect(compactLetterDisplay(['x', 'y', 'z'], () => false)).toEqual({ x: 'a', y: 'a', z: 'a' });
    expect(() => compactLetterDisplay(['x', 'x'], () => false)).toThrow(/"x" appears more than once/);
  });
});
