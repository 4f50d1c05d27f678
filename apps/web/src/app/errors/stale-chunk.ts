// After a redeploy, a page opened before it asks for code files (chunks) whose hashed names no
// longer exist: the import fails. One reload fetches the new index.html and the new chunk names.

/** The page itself, so that tests can watch the reload instead of performing it. */
export const browserPage = {
  reload: () => window.location.reload(),
  /** Set once a reload is asked for: the page is going away, and a second boundary must not count it twice. */
  reloading: false,
};

const RELOADED_AT = 'friable.reloadedForNewVersionAt';
/** A reload within this long of the previous one did not help: do not loop, say so instead. */
export const RELOAD_GUARD_MS = 60_000;

/** How each browser words a failed dynamic import or its CSS (Chromium, Firefox, Safari, Vite's preload). */
const STALE_CHUNK = /Failed to fetch dynamically imported module|error loading dynamically imported module|Importing a module script failed|Unable to preload CSS|'text\/html' is not a valid JavaScript MIME type/i;

export function isStaleChunkError(error: unknown): boolean {
  if (!(error instanceof Error)) return false;
  return error.name === 'ChunkLoadError' || STALE_CHUNK.test(error.message);
}

/**
 * Reloads the page unless it was reloaded for the same reason in the last minute; true when it
 * reloads. The time is kept in sessionStorage, so it holds for this tab across the reload.
 */
export function reloadOnceForNewVersion(now = Date.now()): boolean {
  if (browserPage.reloading) return true;
  const last = Number(sessionStorage.getItem(RELOADED_AT) ?? 0);
  if (now - last < RELOAD_GUARD_MS) return false;
  sessionStorage.setItem(RELOADED_AT, String(now));
  browserPage.reloading = true;
  browserPage.reload();
  return true;
}
