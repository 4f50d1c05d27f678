// Keeps a child process running for npm start: when it dies it is started again after a pause that
// grows while it keeps dying young, and given up after several quick deaths in a row (a bad
// configuration, say) so that the loop does not spin forever.

/**
 * @param {object} options
 * @param {() => import('node:child_process').ChildProcess} options.start starts the process
 * @param {(message: string) => void} options.log
 * @param {(code: number | null, signal: string | null) => void} options.onGiveUp called after too many quick deaths
 * @param {number[]} [options.delays] pauses before each restart, in ms, the last one repeated
 * @param {number} [options.maxQuickDeaths] quick deaths in a row that make it give up
 * @param {number} [options.quickMs] a death within this long of the start is quick
 */
export function supervise({ start, log, onGiveUp, delays = [500, 1_000, 2_000, 5_000], maxQuickDeaths = 5, quickMs = 30_000 }) {
  let child;
  let stopped = false;
  let quickDeaths = 0;
  let timer;
  let starts = 0;
  const launch = () => {
    const startedAt = Date.now();
    starts += 1;
    child = start();
    child.on('exit', (code, signal) => {
      if (stopped) return;
      quickDeaths = Date.now() - startedAt < quickMs ? quickDeaths + 1 : 1;
      const how = signal ? `was killed by ${signal}` : `exited with ${code}`;
      if (quickDeaths >= maxQuickDeaths) {
        log(`the API ${how}, ${quickDeaths} times in a row soon after starting; not starting it again`);
        onGiveUp(code, signal);
        return;
      }
      const delay = delays[Math.min(quickDeaths - 1, delays.length - 1)];
      log(`the API ${how}; starting it again in ${delay / 1000} s…`);
      timer = setTimeout(launch, delay);
    });
  };
  launch();
  return {
    /** The process now running (or the last one). */
    get child() {
      return child;
    },
    /** How many times the process was started. */
    get starts() {
      return starts;
    },
    /** Stops supervising and ends the process; resolves once it has exited. */
    stop(signal = 'SIGTERM') {
      stopped = true;
      clearTimeout(timer);
      if (!child || child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
      return new Promise((resolve) => {
        child.once('exit', () => resolve());
        child.kill(signal);
      });
    },
  };
}
