import { useEffect, useRef, useState, useSyncExternalStore } from 'react';
import { timerState, type DrainTimer, type TimerState } from '../timers/drain-timer';
import { drainTimerStore } from '../timers/drain-timer-store';

/**
 * The drain timers of one trial and round, ticking while any runs. A timer that finishes (stopped by
 * the person, or at its cut-off, even while the page was closed) is handed once to `onFinished`,
 * which records its value.
 */
export function useDrainTimers(trialId: number, roundId: number, onFinished: (timer: DrainTimer, state: Exclude<TimerState, { kind: 'running' }>) => void) {
  const all = useSyncExternalStore(drainTimerStore.subscribe, drainTimerStore.list, drainTimerStore.list);
  const timers = all.filter((t) => t.trialId === trialId && t.roundId === roundId);
  const [now, setNow] = useState(() => Date.now());
  const running = timers.some((t) => t.stoppedAt === null);
  const finish = useRef(onFinished);
  finish.current = onFinished;

  useEffect(() => {
    const tick = () => {
      const at = Date.now();
      drainTimerStore.settle(at);
      setNow(at);
    };
    tick();
    if (!running) return;
    const id = window.setInterval(tick, 250);
    // After a locked screen the interval may have slept: look at the clock at once.
    document.addEventListener('visibilitychange', tick);
    return () => {
      window.clearInterval(id);
      document.removeEventListener('visibilitychange', tick);
    };
  }, [running]);

  useEffect(() => {
    for (const timer of timers) {
      if (timer.stoppedAt === null || timer.recorded) continue;
      const state = timerState(timer, timer.stoppedAt);
      if (state.kind === 'running') continue;
      drainTimerStore.markRecorded(timer.key);
      finish.current(timer, state);
    }
  });

  return { timers, now };
}
