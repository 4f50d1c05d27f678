import { describe, expect, it } from 'vitest';
import { SitePlotIndex } from './site-plot-index';

describe('SitePlotIndex', () => {
  it('finds plots by label whatever the case and surrounding spaces, and keeps their plan', () => {
    const index = SitePlotIndex.of([
      { id: 101, label: 'HL-B1-P01', block: 1, treatmentCode: 'CTRL' },
      { id: 102, label: 'hl-b1-p02', block: 1, treatmentCode: 'GYP', identity: { wholePlot: 'W1' } },
    ]);
    expect(index.find(' hl-b1-p01 ')).toBe(0);
    expect(index.find('HL-B1-P02')).toBe(1);
    expect(index.find('HL-B1-P03')).toBe(-1);
    expect([index.id(1), index.label(1), index.block(1), index.treatmentCode(1), index.identity(1, 'wholePlot')]).toEqual([102, 'hl-b1-p02', 1, 'GYP', 'W1']);
    expect(index.label(0)).toBe('HL-B1-P01');
  });

  it('holds a large site: every label found at its own position, near misses not found', () => {
    const labels = Array.from({ length: 20_000 }, (_, position) => `BG-B${Math.floor(position / 100) + 1}-P${position % 100}`);
    const index = SitePlotIndex.of(labels.map((label, position) => ({ id: position + 1, label, block: 1, treatmentCode: position % 2 ? 'A' : 'B' })));
    expect(index.size).toBe(20_000);
    expect(labels.every((label, position) => index.find(label) === position && index.label(position) === label)).toBe(true);
    expect(index.find('BG-B1-P100')).toBe(-1);
    expect(index.find('BG-B201-P0')).toBe(-1);
    expect(index.find('')).toBe(-1);
  });

  it('takes no plot after the first lookup', () => {
    const index = SitePlotIndex.of([{ id: 1, label: 'A', block: 1, treatmentCode: 'C' }]);
    index.find('A');
    expect(() => index.add({ id: 2, label: 'B', block: 1, treatmentCode: 'C' })).toThrow(RangeError);
  });
});
