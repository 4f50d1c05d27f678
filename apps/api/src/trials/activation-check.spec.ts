import { describe, expect, it } from 'vitest';
import { activationCheck } from './activation-check';

const ready = {
  design: 'rcbd' as const,
  factorCount: 0,
  noControlReason: null,
  treatments: [{ isControl: true }, { isControl: false }],
  measures: [{ id: 1 }],
  rounds: [{ label: 'Day 0', measureIds: [1] }],
  sites: [{ name: 'Hollow Lane', plotCount: 10 }],
};

describe('activationCheck', () => {
  it('passes a complete protocol', () => {
    expect(activationCheck(ready)).toEqual({ ready: true, problems: [] });
  });

  it('lists each failed check in words', () => {
    const check = activationCheck({ design: 'factorial-rcbd', factorCount: 0, noControlReason: '  ', treatments: [{ isControl: false }], measures: [], rounds: [], sites: [{ name: 'Millbrook', plotCount: 0 }] });
    expect(check.ready).toBe(false);
    expect(check.problems).toEqual([
      'A factorial trial needs its two factors with their levels.',
      'The trial needs at least two treatments; it has 1.',
      'No treatment is marked as the control; mark one, or give the reason the trial has none.',
      'The trial needs at least one measure.',
      'The trial needs at least one assessment round.',
      'Site Millbrook is not randomized yet.',
    ]);
  });

  it('accepts a stated reason instead of a control', () => {
    const check = activationCheck({ ...ready, noControlReason: 'Comparing two mulches only', treatments: [{ isControl: false }, { isControl: false }] });
    expect(check.ready).toBe(true);
  });
});
