import type { DrainTimer } from './drain-timer';
import { settleTimer } from './drain-timer';

const STORAGE_KEY = 'friable.drainTimers';
const listeners = new Set<() => void>();
let cache: DrainTimer[] | null = null;

function read(): DrainTimer[] {
  if (cache) return cache;
  try {
    const parsed: unknown = JSON.parse(window.localStorage.getItem(STORAGE_KEY) ?? '[]');
    cache = Array.isArray(parsed) ? (parsed as DrainTimer[]).filter((t) => typeof t?.key === 'string' && Number.isFinite(t.startedAt)) : [];
  } catch {
    cache = [];
  }
  return cache;
}

function write(timers: DrainTimer[]): void {
  cache = timers;
  window.localStorage.setItem(STORAGE_KEY, JSON.stringify(timers));
  for (const listener of listeners) listener();
}

/**
 * The running and finished drain timers, kept in the browser's storage so they outlive a reload or a
 * locked phone. Each change is written at once; every open page sees it.
 */
export const drainTimerStore = {
  list: (): DrainTimer[] => read(),
  subscribe(listener: () => void): () => void {
    listeners.add(listener);
    const onStorage = (event: StorageEvent) => {
      if (event.key !== STORAGE_KEY) return;
      cache = null;
      listener();
    };
    window.addEventListener('storage', onStorage);
    return () => {
      listeners.delete(listener);
      window.removeEventListener('storage', onStorage);
    };
  },
  /** Starts (or starts again) the timer of one plot and measure. */
  start(timer: Omit<DrainTimer, 'stoppedAt' | 'recorded'>): void {
    write([...read().filter((t) => t.key !== timer.key), { ...timer, stoppedAt: null, recorded: false }]);
  },
  stop(key: string, now: number): void {
    write(read().map((t) => (t.key === key && t.stoppedAt === null ? settleTimer({ ...t, stoppedAt: now }, now) : t)));
  },
  /** Stops every timer that has reached its cut-off; returns true when any did. */
  settle(now: number): boolean {
    const timers = read();
    const settled = timers.map((t) => settleTimer(t, now));
    const changed = settled.some((t, i) => t !== timers[i]);
    if (changed) write(settled);
    return changed;
  },
  markRecorded(key: string): void {
    write(read().map((t) => (t.key === key ? { ...t, recorded: true } : t)));
  },
  discard(key: string): void {
    write(read().filter((t) => t.key !== key));
  },
  /** Forget what the store read, so the next read comes from storage (tests, other tabs). */
  reload(): void {
    cache = null;
  },
};
