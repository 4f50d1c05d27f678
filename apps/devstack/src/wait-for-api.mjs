// Waiting for an API process to answer GET /api/health (benchmarks, the cluster test).
import { setTimeout as sleep } from 'node:timers/promises';

/** Resolves once `${url}/api/health` answers 200; throws after `seconds` (60) with what was waited for. */
export async function waitForApi(url, { seconds = 60 } = {}) {
  const deadline = Date.now() + seconds * 1000;
  while (Date.now() < deadline) {
    try {
      if ((await fetch(`${url}/api/health`)).ok) return;
    } catch {
      // not listening yet
    }
    await sleep(250);
  }
  throw new Error(`the API at ${url} did not answer within ${seconds} s`);
}
