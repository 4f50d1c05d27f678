import { createContext, Suspense, useContext, useEffect, useRef, useState, type ReactNode } from 'react';
import { LoadingState } from './states';

// Charts draw one at a time: a chart's turn comes when the one before it has drawn (or after
// TURN_LIMIT_MS), so a page of charts never draws them all in one long task that holds up its tables.
const TURN_LIMIT_MS = 5000;
let lastTurn: Promise<void> = Promise.resolve();

/** A place in the line of charts to draw: `ready` when the chart before has drawn; `release` lets the next one go. */
function takeTurn(): { ready: Promise<void>; release: () => void } {
  let release!: () => void;
  const done = new Promise<void>((resolve) => {
    release = resolve;
  });
  const ready = lastTurn;
  lastTurn = lastTurn.then(() => done);
  return { ready, release };
}

/** After the browser has painted what was drawn (a frame, then a task). */
const afterPaint = (then: () => void) =>
  typeof requestAnimationFrame === 'function' ? requestAnimationFrame(() => setTimeout(then, 0)) : setTimeout(then, 0);

const ChartDrawnContext = createContext<() => void>(() => undefined);

/** Called by a chart once it has drawn (or failed to): the next chart in line may draw. */
export function useChartDrawn(): () => void {
  return useContext(ChartDrawnContext);
}

/**
 * A chart's place on the page, at its height, that loads and draws the chart (its children, which
 * may be lazy) only when it comes near the screen — and one chart at a time, in the order they come
 * into view. Where the browser cannot tell (no IntersectionObserver), or `eager` (a page to print),
 * the chart draws without waiting to be seen.
 */
export function ChartSlot({ height, label, eager = false, children }: { height: number; label: string; eager?: boolean; children: ReactNode }) {
  const place = useRef<HTMLDivElement>(null);
  const [turn, setTurn] = useState<{ release: () => void } | null>(null);

  useEffect(() => {
    let cancelled = false;
    let taken: ReturnType<typeof takeTurn> | null = null;
    const join = () => {
      if (taken || cancelled) return;
      taken = takeTurn();
      const mine = taken;
      void mine.ready.then(() => {
        if (cancelled) return mine.release();
        setTurn({ release: mine.release });
        setTimeout(mine.release, TURN_LIMIT_MS);
      });
    };
    const element = place.current;
    if (eager || typeof IntersectionObserver === 'undefined' || !element) {
      join();
    } else {
      const observer = new IntersectionObserver((entries) => {
        if (entries.some((entry) => entry.isIntersecting)) {
          observer.disconnect();
          join();
        }
      }, { rootMargin: '200px 0px' });
      observer.observe(element);
      return () => {
        cancelled = true;
        observer.disconnect();
        taken?.release();
      };
    }
    return () => {
      cancelled = true;
      taken?.release();
    };
  }, [eager]);

  const drawn = turn ? () => afterPaint(turn.release) : () => undefined;
  return (
    <div ref={place} className="fr-chart-slot" style={{ minHeight: height }} data-chart={label}>
      {turn ? (
        <ChartDrawnContext.Provider value={drawn}>
          <Suspense fallback={<LoadingState what="the chart" />}>{children}</Suspense>
        </ChartDrawnContext.Provider>
      ) : null}
    </div>
  );
}
