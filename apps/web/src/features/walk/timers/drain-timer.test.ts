import { afterEach, describe, expect, it } from 'vitest';
import { clockText, settleTimer, timerKey, timerState, type DrainTimer } from './drain-timer';
import { drainTimerStore } from './drain-timer-store';

const poured = Date.UTC(2027, 2, 15, 9, 0, 0);
const timer = (extra: Partial<DrainTimer> = {}): DrainTimer => ({
  key: timerKey(3, 21, 301, 11),
  trialId: 3,
  siteId: 31,
  roundId: 21,
  plotId: 301,
  plotLabel: 'HL-101',
  measureId: 11,
  startedAt: poured,
  stoppedAt: null,
  cutoff: 600,
  unitSeconds: 1,
  decimals: 0,
  recorded: false,
  ...extra,
});

describe('drain timer', () => {
  afterEach(() => drainTimerStore.reload());

  it('counts from the moment the water was poured, not from ticks', () => {
    expect(timerState(timer(), poured + 90_400)).toEqual({ kind: 'running', elapsedSeconds: 90.4, remainingSeconds: 509.6 });
  });

  it('gives the drained time in the measure’s unit and decimals', () => {
    expect(timerState(timer({ stoppedAt: poured + 412_300 }), poured + 999_999)).toEqual({ kind: 'drained', elapsedSeconds: 412.3, valueText: '412' });
    // A drain time kept in minutes with two decimals: 412.3 s = 6.871… min → "6.87".
    expect(timerState(timer({ stoppedAt: poured + 412_300, cutoff: 10, unitSeconds: 60, decimals: 2 }), 0)).toMatchObject({ kind: 'drained', valueText: '6.87' });
  });

  it('stops itself at the cut-off with a censored value, never the cut-off as a measured time', () => {
    expect(timerState(timer(), poured + 600_000)).toEqual({ kind: 'cut-off', elapsedSeconds: 600, valueText: '>600' });
    expect(timerState(timer(), poured + 3_600_000)).toEqual({ kind: 'cut-off', elapsedSeconds: 600, valueText: '>600' });
    expect(timerState(timer({ cutoff: 10, unitSeconds: 60 }), poured + 601_000)).toMatchObject({ kind: 'cut-off', valueText: '>10' });
    // Just before the cut-off it is still running.
    expect(timerState(timer(), poured + 599_999).kind).toBe('running');
  });

  it('settles a timer found past its cut-off (after a reload) at the cut-off itself', () => {
    expect(settleTimer(timer(), poured + 2_000_000).stoppedAt).toBe(poured + 600_000);
    expect(settleTimer(timer(), poured + 100_000).stoppedAt).toBeNull();
    const stopped = timer({ stoppedAt: poured + 5_000 });
    expect(settleTimer(stopped, poured + 2_000_000)).toBe(stopped);
  });

  it('keeps several timers in the browser’s storage, so they survive a reload', () => {
    drainTimerStore.start(timer());
    drainTimerStore.start(timer({ key: timerKey(3, 21, 302, 11), plotId: 302, plotLabel: 'HL-102', startedAt: poured + 30_000 }));
    drainTimerStore.stop(timerKey(3, 21, 302, 11), poured + 230_000);
    drainTimerStore.reload();
    const [first, second] = drainTimerStore.list();
    expect(first).toMatchObject({ plotLabel: 'HL-101', stoppedAt: null, recorded: false });
    expect(second).toMatchObject({ plotLabel: 'HL-102', stoppedAt: poured + 230_000 });
    expect(drainTimerStore.settle(poured + 700_000)).toBe(true);
    expect(drainTimerStore.list()[0].stoppedAt).toBe(poured + 600_000);
    drainTimerStore.markRecorded(first.key);
    drainTimerStore.discard(second.key);
    drainTimerStore.reload();
    expect(drainTimerStore.list()).toEqual([expect.objectContaining({ plotLabel: 'HL-101', recorded: true })]);
  });

  it('starting a plot’s timer again replaces the old one', () => {
    drainTimerStore.start(timer());
    drainTimerStore.start(timer({ startedAt: poured + 60_000 }));
    expect(drainTimerStore.list()).toHaveLength(1);
    expect(drainTimerStore.list()[0].startedAt).toBe(poured + 60_000);
  });

  it('reads a stopwatch', () => {
    expect(clockText(0)).toBe('0:00');
    expect(clockText(65.9)).toBe('1:05');
    expect(clockText(600)).toBe('10:00');
  });
});
