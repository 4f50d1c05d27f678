import { describe, expect, it } from 'vitest';
import { activationCheck } from './activation-check';

const ready = {
  design: 'rcbd' as const,
  factorCount: 0,
  noControlReason: null,
  treatments: [{ isControl: true }, { isControl: false }],
  measures: [{ id: 1 }],
  rounds: [{ label: 'Day 0', measureIds: [1] }],
  sites: [{ name: 'Hollow Lane', plotCount: 10, warnings: [] as string[] }],
};

describe('activationCheck', () => {
  it('passes a complete protocol', () => {
    expect(activationCheck(ready)).toEqual({ ready: true, problems: [], warnings: [] });
  });

  it('lists each failed check in words', () => {
    const check = activationCheck({ design: 'factorial-rcbd', factorCount: 0, noControlReason: '  ', treatments: [{ isControl: false }], measures: [], rounds: [], sites: [{ name: 'Millbrook', plotCount: 0, warnings: [] }] });
    expect(check.ready).toBe(false);
    expect(check.problems).toEqual([
      'The factorial in randomized complete blocks design needs its factors with their levels.',
      'The trial needs at least two treatments; it has 1.',
      'No treatment is marked as the control; mark one, or give the reason the trial has none.',
      'The trial needs at least one measure.',
      'The trial needs at least one assessment round.',
      'Site Millbrook is not randomized yet.',
    ]);
  });

  it('refuses a number of factors the design does not take, in words naming their order', () => {
    expect(activationCheck({ ...ready, design: 'split-plot', factorCount: 3 }).problems).toEqual([
      'A split plot in blocks takes exactly 2 factors, in this order: the whole-plot factor, then the sub-plot factor; 3 were given. Change the factors or the design.',
    ]);
    expect(activationCheck({ ...ready, design: 'split-split-plot', factorCount: 3 }).problems).toEqual([]);
    expect(activationCheck({ ...ready, design: 'factorial-crd', factorCount: 4 }).problems).toEqual([]);
  });

  it('passes each site\'s design warnings on, named by site, without blocking activation', () => {
    const check = activationCheck({ ...ready, sites: [{ name: 'Hollow Lane', plotCount: 12, warnings: ['Whole-plot error has only 1 degree of freedom at the site.'] }] });
    expect(check).toEqual({ ready: true, problems: [], warnings: ['Hollow Lane: Whole-plot error has only 1 degree of freedom at the site.'] });
  });

  it('accepts a stated reason instead of a control', () => {
    const check = activationCheck({ ...ready, noControlReason: 'Comparing two mulches only', treatments: [{ isControl: false }, { isControl: false }] });
    expect(check.ready).toBe(true);
  });
});
