/**
 * The drain timer of the Round walk: pour the water, start; it has drained, stop. A timer keeps the
 * moment it started (and stopped), never a running count, so it survives a locked screen, a closed
 * tab or a reload: the time is always "now minus then". At the measure's cut-off it stops itself and
 * gives a censored value (">600"), never the cut-off as if it had been measured.
 */
export interface DrainTimer {
  /** One timer per trial, round, plot and measure. */
  readonly key: string;
  readonly trialId: number;
  readonly siteId: number;
  readonly roundId: number;
  readonly plotId: number;
  readonly plotLabel: string;
  readonly measureId: number;
  /** When the water was poured (milliseconds since 1970). */
  readonly startedAt: number;
  /** When it was seen to have drained; null while running. A timer that reached its cut-off stops at it. */
  readonly stoppedAt: number | null;
  /** The measure's cut-off in its own unit (600 for 600 s), and that unit in seconds (1 for s, 60 for min). */
  readonly cutoff: number;
  readonly unitSeconds: number;
  /** Decimals the measure keeps. */
  readonly decimals: number;
  /** True once the walk has taken the result (queued it to be sent). */
  readonly recorded: boolean;
}

export type TimerState =
  | { readonly kind: 'running'; readonly elapsedSeconds: number; readonly remainingSeconds: number }
  | { readonly kind: 'drained'; readonly elapsedSeconds: number; readonly valueText: string }
  | { readonly kind: 'cut-off'; readonly elapsedSeconds: number; readonly valueText: string };

export const timerKey = (trialId: number, roundId: number, plotId: number, measureId: number) => `${trialId}:${roundId}:${plotId}:${measureId}`;

const cutoffMilliseconds = (timer: DrainTimer) => timer.cutoff * timer.unitSeconds * 1000;

/** Canonical decimal text of a number to `decimals` places, rounded half up ("412", "6.87"). */
function decimalText(value: number, decimals: number): string {
  const factor = 10 ** decimals;
  return (Math.round(value * factor + Number.EPSILON) / factor).toFixed(decimals);
}

/** The cut-off as the measure writes it: 600 → "600", 10 min → "10". */
function cutoffText(timer: DrainTimer): string {
  return String(timer.cutoff);
}

/**
 * Timer state — what a timer shows at `now`: running (with the time so far and left), drained
 * (the measured time in the measure's unit and decimals) or stopped at the cut-off (">600").
 * Example: a 600 s timer started 90.4 s ago → `{ kind: 'running', elapsedSeconds: 90.4, remainingSeconds: 509.6 }`;
 * stopped after 412.3 s → `{ kind: 'drained', valueText: '412' }`; still running at 600 s → `{ kind: 'cut-off', valueText: '>600' }`.
 */
export function timerState(timer: DrainTimer, now: number): TimerState {
  const limit = cutoffMilliseconds(timer);
  const end = timer.stoppedAt ?? now;
  const elapsedMs = Math.max(0, end - timer.startedAt);
  if (elapsedMs >= limit) return { kind: 'cut-off', elapsedSeconds: limit / 1000, valueText: `>${cutoffText(timer)}` };
  if (timer.stoppedAt === null) return { kind: 'running', elapsedSeconds: elapsedMs / 1000, remainingSeconds: (limit - elapsedMs) / 1000 };
  const inUnit = elapsedMs / 1000 / timer.unitSeconds;
  return { kind: 'drained', elapsedSeconds: elapsedMs / 1000, valueText: decimalText(inUnit, timer.decimals) };
}

/** A timer at `now`, stopped at its cut-off when it has reached it (so a reload finds it finished). */
export function settleTimer(timer: DrainTimer, now: number): DrainTimer {
  if (timer.stoppedAt !== null) return timer;
  const limit = cutoffMilliseconds(timer);
  return now - timer.startedAt >= limit ? { ...timer, stoppedAt: timer.startedAt + limit } : timer;
}

/** "1:05", "10:00": minutes and seconds of a stopwatch. */
export function clockText(seconds: number): string {
  const whole = Math.max(0, Math.floor(seconds));
  return `${Math.floor(whole / 60)}:${String(whole % 60).padStart(2, '0')}`;
}
