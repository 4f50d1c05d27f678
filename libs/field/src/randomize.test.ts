import fc from 'fast-check';
import { MersenneTwister19937 } from 'random-js';
import { describe, expect, it } from 'vitest';
import { plotLabelPrefix, randomizeSite, seedFromText, type TrialDesign } from './randomize';

const codes = fc.uniqueArray(fc.string({ minLength: 1, maxLength: 4 }).filter((code) => code.trim() !== ''), {
  minLength: 2,
  maxLength: 10,
});
const text = fc.string({ minLength: 1, maxLength: 20 }).filter((value) => value.trim() !== '');
const blockDesign = fc.constantFrom<TrialDesign>('rcbd', 'factorial-rcbd');
const anyDesign = fc.constantFrom<TrialDesign>('crd', 'rcbd', 'factorial-rcbd');

function layoutCodes(layout: readonly { treatmentCode: string }[]): string {
  return layout.map((plot) => plot.treatmentCode).join('|');
}

describe('randomizeSite properties (DOMAIN.md "Design rules of thumb": randomize separately in each block)', () => {
  it('rcbd and factorial-rcbd: every block is a permutation of the treatments, positions 1…t', () => {
    fc.assert(
      fc.property(text, text, blockDesign, codes, fc.integer({ min: 1, max: 8 }), (seed, siteKey, design, treatments, blocks) => {
        const layout = randomizeSite({ seed, siteKey, design, treatments, blocks, labelPrefix: 'GH' });
        expect(layout).toHaveLength(treatments.length * blocks);
        for (let block = 1; block <= blocks; block += 1) {
          const inBlock = layout.filter((plot) => plot.block === block);
          expect([...inBlock.map((plot) => plot.treatmentCode)].sort()).toEqual([...treatments].sort());
          expect(inBlock.map((plot) => plot.position)).toEqual(treatments.map((_, index) => index + 1));
        }
      }),
    );
  });

  it('crd: every treatment b times over positions 1…t·b, block = replicate group of t positions', () => {
    fc.assert(
      fc.property(text, text, codes, fc.integer({ min: 1, max: 8 }), (seed, siteKey, treatments, blocks) => {
        const layout = randomizeSite({ seed, siteKey, design: 'crd', treatments, blocks, labelPrefix: 'GH' });
        expect(layout.map((plot) => plot.position)).toEqual(layout.map((_, index) => index + 1));
        for (const code of treatments) {
          expect(layout.filter((plot) => plot.treatmentCode === code)).toHaveLength(blocks);
        }
        for (const plot of layout) expect(plot.block).toBe(Math.ceil(plot.position / treatments.length));
      }),
    );
  });

  it('same seed and site give the identical layout', () => {
    fc.assert(
      fc.property(text, text, anyDesign, codes, fc.integer({ min: 1, max: 6 }), (seed, siteKey, design, treatments, blocks) => {
        const input = { seed, siteKey, design, treatments, blocks, labelPrefix: 'NS' };
        expect(randomizeSite(input)).toEqual(randomizeSite({ ...input, treatments: [...treatments] }));
      }),
    );
  });

  it('labels are unique within a site', () => {
    fc.assert(
      fc.property(text, anyDesign, codes, fc.integer({ min: 1, max: 12 }), (seed, design, treatments, blocks) => {
        const layout = randomizeSite({ seed, siteKey: 'site', design, treatments, blocks, labelPrefix: 'GH' });
        expect(new Set(layout.map((plot) => plot.label)).size).toBe(layout.length);
      }),
    );
  });

  it('adding a block leaves the existing blocks unchanged', () => {
    fc.assert(
      fc.property(text, blockDesign, codes, fc.integer({ min: 1, max: 6 }), (seed, design, treatments, blocks) => {
        const input = { seed, siteKey: 'site', design, treatments, labelPrefix: 'GH' };
        const shorter = randomizeSite({ ...input, blocks });
        const longer = randomizeSite({ ...input, blocks: blocks + 1 });
        expect(longer.slice(0, shorter.length)).toEqual(shorter);
      }),
    );
  });

  // Two independent layouts of 4 treatments × 4 blocks coincide with probability (1/24)^4 ≈ 3·10⁻⁶,
  // so among 500 pairs we expect none; allowing up to 5 keeps the test far from flaky.
  const treatments = ['C', 'G', 'K', 'M'];
  it('different sites with the same seed give different layouts in the vast majority of 500 seeds', () => {
    let identical = 0;
    for (let index = 0; index < 500; index += 1) {
      const input = { seed: `seed-${index}`, design: 'rcbd' as const, treatments, blocks: 4, labelPrefix: 'GH' };
      const north = randomizeSite({ ...input, siteKey: 'north' });
      const south = randomizeSite({ ...input, siteKey: 'south' });
      if (layoutCodes(north) === layoutCodes(south)) identical += 1;
    }
    expect(identical).toBeLessThanOrEqual(5);
  });

  it('different seeds at the same site give different layouts in the vast majority of 500 pairs', () => {
    let identical = 0;
    for (let index = 0; index < 500; index += 1) {
      const input = { siteKey: 'north', design: 'crd' as const, treatments, blocks: 4, labelPrefix: 'GH' };
      const first = randomizeSite({ ...input, seed: `trial-${index}` });
      const second = randomizeSite({ ...input, seed: `trial-${index + 500}` });
      if (layoutCodes(first) === layoutCodes(second)) identical += 1;
    }
    expect(identical).toBeLessThanOrEqual(5);
  });
});

describe('randomizeSite labels and errors', () => {
  it('labels block designs GH-B2-P07 and crd GH-P07', () => {
    const seven = ['A', 'B', 'C', 'D', 'E', 'F', 'G'];
    const rcbd = randomizeSite({ seed: 's', siteKey: 'k', design: 'rcbd', treatments: seven, blocks: 2, labelPrefix: 'GH' });
    expect(rcbd.find((plot) => plot.block === 2 && plot.position === 7)?.label).toBe('GH-B2-P07');
    const crd = randomizeSite({ seed: 's', siteKey: 'k', design: 'crd', treatments: seven, blocks: 2, labelPrefix: 'GH' });
    expect(crd[6]!.label).toBe('GH-P07');
    expect(crd[13]!.label).toBe('GH-P14');
  });

  it('widens the position to three digits when a crd site has over 99 plots', () => {
    const layout = randomizeSite({ seed: 's', siteKey: 'k', design: 'crd', treatments: ['A', 'B', 'C', 'D'], blocks: 30, labelPrefix: 'GH' });
    expect(layout[6]!.label).toBe('GH-P007');
    expect(layout[119]!.label).toBe('GH-P120');
  });

  it('returns frozen plots', () => {
    const layout = randomizeSite({ seed: 's', siteKey: 'k', design: 'rcbd', treatments: ['A', 'B'], blocks: 2, labelPrefix: 'GH' });
    expect(Object.isFrozen(layout)).toBe(true);
    expect(Object.isFrozen(layout[0])).toBe(true);
  });

  it('pins the layout for one seed (output of this implementation, layout version 1: a change here would re-randomize every stored site)', () => {
    const layout = randomizeSite({ seed: 'clay-2025', siteKey: 'site-1', design: 'rcbd', treatments: ['C', 'G', 'K', 'M'], blocks: 2, labelPrefix: 'GH' });
    expect(layoutCodes(layout)).toBe('G|K|C|M|G|M|K|C');
  });

  it('throws RangeError naming the field', () => {
    const base = { seed: 's', siteKey: 'k', design: 'rcbd' as const, treatments: ['A', 'B'], blocks: 2, labelPrefix: 'GH' };
    expect(() => randomizeSite({ ...base, blocks: 0 })).toThrow(/randomizeSite: blocks must be a whole number of at least 1/);
    expect(() => randomizeSite({ ...base, blocks: 1.5 })).toThrow(/blocks/);
    expect(() => randomizeSite({ ...base, treatments: ['A'] })).toThrow(/treatments must be a list of at least 2/);
    expect(() => randomizeSite({ ...base, treatments: ['A', 'B', 'A'] })).toThrow(/treatments must be distinct codes \(got "A twice"\)/);
    expect(() => randomizeSite({ ...base, treatments: ['A', ' '] })).toThrow(/treatments\[\]/);
    expect(() => randomizeSite({ ...base, seed: '' })).toThrow(/seed/);
    expect(() => randomizeSite({ ...base, siteKey: ' ' })).toThrow(/siteKey/);
    expect(() => randomizeSite({ ...base, labelPrefix: '' })).toThrow(/labelPrefix/);
    expect(() => randomizeSite({ ...base, design: 'latin-square' as never })).toThrow(/design/);
  });
});

describe('seedFromText', () => {
  it('packs UTF-8 bytes little-endian after the byte count', () => {
    expect(seedFromText('')).toEqual([0]);
    expect(seedFromText('ab')).toEqual([2, 0x6261]);
    expect(seedFromText('abcde')).toEqual([5, 0x64636261, 0x65]);
    expect(seedFromText('é')).toEqual([2, 0xa9c3]); // U+00E9 is C3 A9 in UTF-8
  });

  it('gives different words for different texts, and for different splits of one text', () => {
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme' }), fc.string({ unit: 'grapheme' }), (first, second) => {
        fc.pre(first !== second);
        expect(seedFromText(first)).not.toEqual(seedFromText(second));
      }),
    );
    expect([...seedFromText('ab'), ...seedFromText('c')]).not.toEqual([...seedFromText('a'), ...seedFromText('bc')]);
  });

  it('seeds random-js MT19937 like the reference init_by_array (mt19937ar.out, from memory)', () => {
    // Matsumoto & Nishimura's mt19937ar.c test: init_by_array({0x123, 0x234, 0x345, 0x456})
    // prints 1067595299 955945823 477289528 as its first outputs (values from memory).
    const engine = MersenneTwister19937.seedWithArray([0x123, 0x234, 0x345, 0x456]);
    expect([engine.next() >>> 0, engine.next() >>> 0, engine.next() >>> 0]).toEqual([1067595299, 955945823, 477289528]);
  });
});

describe('plotLabelPrefix', () => {
  it('uses initials of up to three words, skipping small words', () => {
    expect(plotLabelPrefix('Green Hill')).toBe('GH');
    expect(plotLabelPrefix('Green Hill Community Garden')).toBe('GHC');
    expect(plotLabelPrefix('The Orchard at Elm Street')).toBe('OES');
  });

  it('uses the first three letters of a single word and drops accents', () => {
    expect(plotLabelPrefix('riverside')).toBe('RIV');
    expect(plotLabelPrefix('Östra Trädgården')).toBe('OT');
    expect(plotLabelPrefix('Site 2')).toBe('SIT');
  });

  it('always gives 2–3 uppercase letters', () => {
    fc.assert(
      fc.property(fc.string(), (name) => {
        try {
          expect(plotLabelPrefix(name)).toMatch(/^[A-Z]{2,3}$/);
        } catch (error) {
          expect(error).toBeInstanceOf(RangeError);
        }
      }),
    );
  });

  it('throws RangeError for names without two Latin letters', () => {
    expect(() => plotLabelPrefix('7')).toThrow(/plotLabelPrefix: siteName must be a name with at least two Latin letters/);
    expect(() => plotLabelPrefix('A')).toThrow(RangeError);
  });
});
