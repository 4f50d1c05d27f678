import { Button } from '@blueprintjs/core';
import { clockText, timerState, type DrainTimer } from '../timers/drain-timer';

/** The row of drain timers running in this round, on every plot: each with its plot, clock and stop button. */
export function RunningTimers({ timers, now, onStop, onOpen }: { timers: DrainTimer[]; now: number; onStop: (timer: DrainTimer) => void; onOpen: (timer: DrainTimer) => void }) {
  const running = timers.filter((t) => t.stoppedAt === null);
  if (running.length === 0) return null;
  return (
    <ul className="fr-walk-timers" aria-label="Running drain timers">
      {running.map((timer) => {
        const state = timerState(timer, now);
        return (
          <li key={timer.key} className="fr-walk-timers__item">
            <button type="button" className="fr-walk-timers__plot fr-touch" onClick={() => onOpen(timer)}>
              {timer.plotLabel}
            </button>
            <span className="fr-walk-timers__clock" role="timer" aria-label={`${timer.plotLabel} drain timer`}>
              {clockText(state.elapsedSeconds)}
            </span>
            <Button className="fr-touch" intent="success" icon="stop" aria-label={`Stop ${timer.plotLabel}`} text="Stop" onClick={() => onStop(timer)} />
          </li>
        );
      })}
    </ul>
  );
}
