import { Workbox } from 'workbox-window';

/**
 * Registers the service worker that keeps the app shell for offline use (built by vite-plugin-pwa as
 * /sw.js). Only in a built app: the development server serves modules that change as they are edited.
 */
export function registerServiceWorker(): void {
  if (!import.meta.env.PROD || !('serviceWorker' in navigator)) return;
  const workbox = new Workbox('/sw.js', { scope: '/' });
  // A failed registration (private window, storage full) leaves the app working online as before.
  workbox.register().catch(() => undefined);
}
