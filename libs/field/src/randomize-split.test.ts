import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { randomizeSite, type PlotAssignment, type RandomizationFactor } from './randomize';

// Level codes of 1–3 letters; a factor has 2–5 of them. Codes of different factors use different
// alphabets so that joined combination codes never clash.
const levelsFrom = (alphabet: string) =>
  fc.uniqueArray(fc.stringMatching(new RegExp(`^[${alphabet}]{1,3}$`)), { minLength: 2, maxLength: 5 });
const factor = (name: string, alphabet: string) => levelsFrom(alphabet).map((levels): RandomizationFactor => ({ name, levels }));
const splitFactors = fc.tuple(factor('Amendment', 'A-E'), factor('Mulch', '0-9'));
const splitSplitFactors = fc.tuple(factor('Amendment', 'A-E'), factor('Mulch', '0-9'), factor('Variety', 'v-z'));
const seedText = fc.string({ minLength: 1, maxLength: 20 }).filter((value) => value.trim() !== '');
const blockCount = fc.integer({ min: 1, max: 6 });

function sorted(values: readonly string[]): string[] {
  return [...values].sort();
}

/** Groups plots by a key, keeping the order of first appearance. */
function groupBy(plots: readonly PlotAssignment[], key: (plot: PlotAssignment) => string): PlotAssignment[][] {
  const groups = new Map<string, PlotAssignment[]>();
  for (const plot of plots) groups.set(key(plot), [...(groups.get(key(plot)) ?? []), plot]);
  return [...groups.values()];
}

const sameList = (a: readonly unknown[], b: readonly unknown[]) => a.length === b.length && a.every((value, index) => value === b[index]);

/**
 * The randomization restrictions of a split plot (Gomez & Gomez 1984, 2nd ed., §3.4.1; §3.5.1 for
 * the split-split plot): in every block each whole-plot level occupies exactly one whole plot, all
 * sub plots of that whole plot carry it, each sub-plot level appears once inside every whole plot,
 * each sub-sub-plot level once inside every sub plot, and a unit's plots sit side by side.
 * Returns the first restriction broken, in words, or null (one assertion per layout keeps 1000
 * layouts fast).
 */
function splitRestrictionBroken(layout: readonly PlotAssignment[], factors: readonly RandomizationFactor[], blocks: number): string | null {
  const [whole, sub, subSub] = factors;
  const plotsPerWhole = sub!.levels.length * (subSub?.levels.length ?? 1);
  if (layout.length !== blocks * whole!.levels.length * plotsPerWhole) return `${layout.length} plots`;
  for (const plot of layout) if (plot.treatmentCode !== plot.levels.join('')) return `${plot.label} is ${plot.treatmentCode}`;
  for (let block = 1; block <= blocks; block += 1) {
    const inBlock = layout.filter((plot) => plot.block === block);
    if (!inBlock.every((plot, index) => plot.position === index + 1)) return `block ${block}: positions out of order`;
    const wholePlots = groupBy(inBlock, (plot) => String(plot.wholePlot));
    if (!sameList(wholePlots.map((plots) => plots[0]!.wholePlot), whole!.levels.map((_, index) => index + 1))) return `block ${block}: whole plots not 1…a`;
    if (!sameList(sorted(wholePlots.map((plots) => plots[0]!.levels[0]!)), sorted(whole!.levels))) return `block ${block}: a whole-plot level twice or missing`;
    for (const plots of wholePlots) {
      const where = `block ${block}, whole plot ${plots[0]!.wholePlot}`;
      if (plots.length !== plotsPerWhole) return `${where}: ${plots.length} plots`;
      if (new Set(plots.map((plot) => plot.levels[0])).size !== 1) return `${where}: two whole-plot levels`;
      if (!plots.every((plot, index) => plot.position === plots[0]!.position + index)) return `${where}: not side by side`;
      const subPlots = groupBy(plots, (plot) => String(plot.subPlot));
      if (!sameList(sorted(subPlots.map((group) => group[0]!.levels[1]!)), sorted(sub!.levels))) return `${where}: a sub-plot level twice or missing`;
      for (const group of subPlots) {
        if (new Set(group.map((plot) => plot.levels[1])).size !== 1) return `${where}: a sub plot with two sub-plot levels`;
        if (subSub ? !sameList(sorted(group.map((plot) => plot.levels[2]!)), sorted(subSub.levels)) : group.length !== 1) return `${where}: sub-sub plots wrong`;
      }
    }
  }
  return null;
}

describe('randomizeSite: split plots keep their restrictions on every seed', () => {
  it('split plot: whole plots randomized within blocks, sub plots within whole plots (1000 seeds)', () => {
    fc.assert(
      fc.property(seedText, seedText, splitFactors, blockCount, (seed, siteKey, factors, blocks) => {
        const layout = randomizeSite({ seed, siteKey, design: 'split-plot', factors, blocks, labelPrefix: 'HL' });
        expect(splitRestrictionBroken(layout, factors, blocks)).toBeNull();
        expect(layout.every((plot) => plot.subSubPlot === null)).toBe(true);
      }),
      { numRuns: 1000 },
    );
  });

  it('split-split plot: sub-sub plots randomized within sub plots as well (500 seeds)', () => {
    fc.assert(
      fc.property(seedText, seedText, splitSplitFactors, fc.integer({ min: 1, max: 4 }), (seed, siteKey, factors, blocks) => {
        const layout = randomizeSite({ seed, siteKey, design: 'split-split-plot', factors, blocks, labelPrefix: 'HL' });
        expect(splitRestrictionBroken(layout, factors, blocks)).toBeNull();
        expect(layout.every((plot) => plot.subSubPlot !== null && plot.subSubPlot >= 1)).toBe(true);
      }),
      { numRuns: 500 },
    );
  });

  it('the restriction check itself catches a sub plot swapped into another whole plot, and a whole plot split up', () => {
    const factors: RandomizationFactor[] = [
      { name: 'Amendment', levels: ['C', 'G'] },
      { name: 'Mulch', levels: ['0', '5'] },
    ];
    const layout = randomizeSite({ seed: 's', siteKey: 'k', design: 'split-plot', factors, blocks: 2, labelPrefix: 'HL' });
    expect(splitRestrictionBroken(layout, factors, 2)).toBeNull();
    // Plots 2 and 3 of block 1 lie in different whole plots: exchanging their treatments breaks the whole plots.
    const swapped = layout.map((plot, index) =>
      index === 1 ? { ...plot, treatmentCode: layout[2]!.treatmentCode, levels: layout[2]!.levels } : index === 2 ? { ...plot, treatmentCode: layout[1]!.treatmentCode, levels: layout[1]!.levels } : plot,
    );
    expect(splitRestrictionBroken(swapped, factors, 2)).toMatch(/block 1.*whole-plot level/);
    const moved = layout.map((plot, index) => (index === 1 ? { ...plot, wholePlot: 2 } : plot));
    expect(splitRestrictionBroken(moved, factors, 2)).not.toBeNull();
  });

  it('same seed and site give the identical layout; adding a block leaves the others unchanged', () => {
    fc.assert(
      fc.property(seedText, splitFactors, blockCount, (seed, factors, blocks) => {
        const input = { seed, siteKey: 'site-7', design: 'split-plot' as const, factors, labelPrefix: 'HL' };
        const layout = randomizeSite({ ...input, blocks });
        expect(randomizeSite({ ...input, blocks, factors: factors.map((f) => ({ ...f, levels: [...f.levels] })) })).toEqual(layout);
        expect(randomizeSite({ ...input, blocks: blocks + 1 }).slice(0, layout.length)).toEqual(layout);
      }),
    );
  });

  it('labels are unique within a site and name the block, whole plot and sub plot', () => {
    fc.assert(
      fc.property(seedText, splitSplitFactors, fc.integer({ min: 1, max: 3 }), (seed, factors, blocks) => {
        const layout = randomizeSite({ seed, siteKey: 'k', design: 'split-split-plot', factors, blocks, labelPrefix: 'QH' });
        expect(new Set(layout.map((plot) => plot.label)).size).toBe(layout.length);
        expect(layout.filter((plot) => plot.label !== `QH-B${plot.block}-W${plot.wholePlot}-S${plot.subPlot}-SS${plot.subSubPlot}`)).toEqual([]);
      }),
    );
  });

  // A block of 3 whole-plot levels has 3! = 6 orders, each sub plot of 2 levels 2 orders: with 400
  // seeds every whole-plot order should turn up (each has chance 1/6; missing one has probability
  // about 6·(5/6)^400 ≈ 10⁻³¹) and no order should dominate (expected 66.7 each; 120 is > 7 SDs away).
  it('the whole-plot order varies from seed to seed, every order turning up', () => {
    const counts = new Map<string, number>();
    for (let index = 0; index < 400; index += 1) {
      const layout = randomizeSite({
        seed: `split-${index}`,
        siteKey: 'site-1',
        design: 'split-plot',
        factors: [
          { name: 'Amendment', levels: ['C', 'G', 'K'] },
          { name: 'Mulch', levels: ['0', '5'] },
        ],
        blocks: 1,
        labelPrefix: 'HL',
      });
      const order = groupBy(layout, (plot) => String(plot.wholePlot))
        .map((plots) => plots[0]!.levels[0])
        .join('');
      counts.set(order, (counts.get(order) ?? 0) + 1);
    }
    expect(counts.size).toBe(6);
    for (const count of counts.values()) expect(count).toBeLessThan(120);
  });
});

describe('randomizeSite: factorials', () => {
  const factors: RandomizationFactor[] = [
    { name: 'Mulch material', levels: ['W', 'S'] },
    { name: 'Mulch depth', levels: ['0', '5', '10'] },
  ];

  it('factorial-rcbd from factors gives the layout of its combination codes (so stored factorial layouts stay as they were)', () => {
    fc.assert(
      fc.property(seedText, blockCount, (seed, blocks) => {
        const base = { seed, siteKey: 'site-2', design: 'factorial-rcbd' as const, blocks, labelPrefix: 'MB' };
        const fromFactors = randomizeSite({ ...base, factors });
        const fromCodes = randomizeSite({ ...base, treatments: ['W0', 'W5', 'W10', 'S0', 'S5', 'S10'] });
        expect(fromFactors.map((plot) => [plot.label, plot.treatmentCode])).toEqual(fromCodes.map((plot) => [plot.label, plot.treatmentCode]));
        for (const plot of fromFactors) expect(plot.levels.join('')).toBe(plot.treatmentCode);
      }),
    );
  });

  it('factorial-crd: every combination r times over the whole site; four factors give every combination', () => {
    const four: RandomizationFactor[] = [
      { name: 'A', levels: ['A1', 'A2'] },
      { name: 'B', levels: ['B1', 'B2', 'B3'] },
      { name: 'C', levels: ['C1', 'C2'] },
      { name: 'D', levels: ['D1', 'D2'] },
    ];
    const layout = randomizeSite({ seed: 'four', siteKey: 'k', design: 'factorial-crd', factors: four, blocks: 3, labelPrefix: 'QH' });
    expect(layout).toHaveLength(24 * 3);
    const counts = new Map<string, number>();
    for (const plot of layout) counts.set(plot.treatmentCode, (counts.get(plot.treatmentCode) ?? 0) + 1);
    expect(counts.size).toBe(24);
    expect([...counts.values()].every((count) => count === 3)).toBe(true);
    expect(layout[0]!.label).toMatch(/^QH-P\d{2}$/);
    expect(layout.every((plot) => plot.wholePlot === null && plot.subPlot === null)).toBe(true);
  });

  it('refuses the wrong number of factors, a factor with one level, and level codes that join into the same combination', () => {
    const base = { seed: 's', siteKey: 'k', blocks: 2, labelPrefix: 'GH' };
    expect(() => randomizeSite({ ...base, design: 'split-plot', factors: [factors[0]!] })).toThrow(
      /randomizeSite: factors must be a list of exactly 2 factors for a split plot in blocks design/,
    );
    expect(() => randomizeSite({ ...base, design: 'split-plot' })).toThrow(/factors must be a list of exactly 2/);
    expect(() => randomizeSite({ ...base, design: 'split-split-plot', factors })).toThrow(/exactly 3 factors/);
    expect(() => randomizeSite({ ...base, design: 'factorial-rcbd', factors: [factors[0]!, factors[1]!, factors[0]!, factors[1]!, factors[0]!] })).toThrow(
      /2 to 4 factors/,
    );
    expect(() => randomizeSite({ ...base, design: 'factorial-rcbd', factors: [{ name: 'A', levels: ['1'] }, factors[1]!] })).toThrow(
      /factors\[0\]\.levels must be a list of at least 2 level codes/,
    );
    expect(() =>
      randomizeSite({
        ...base,
        design: 'factorial-rcbd',
        factors: [
          { name: 'A', levels: ['1', '11'] },
          { name: 'B', levels: ['1', '11'] },
        ],
      }),
    ).toThrow(/factors must be distinct codes \(got "111 twice"\)/);
  });

  it('pins a split-plot layout for one seed (output of this implementation, layout version 1: a change would re-randomize stored sites)', () => {
    const layout = randomizeSite({ seed: 'fernwick-mulch-2027', siteKey: 'site-1', design: 'split-plot', factors, blocks: 2, labelPrefix: 'HL' });
    expect(layout.map((plot) => `${plot.label}:${plot.treatmentCode}`).slice(0, 6)).toEqual(['HL-B1-W1-S1:S10', 'HL-B1-W1-S2:S5', 'HL-B1-W1-S3:S0', 'HL-B1-W2-S1:W10', 'HL-B1-W2-S2:W0', 'HL-B1-W2-S3:W5']);
  });
});
