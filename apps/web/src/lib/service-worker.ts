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

/**
 * Calls `then` once when a service worker starts controlling this page (the first visit, or after an
 * update). What was loaded before went past it and was not kept for offline use; loading it again
 * then lets the worker keep it. Returns the unsubscribe function.
 */
export function onServiceWorkerControl(then: () => void): () => void {
  if (!('serviceWorker' in navigator)) return () => undefined;
  const container = navigator.serviceWorker;
  const listener = () => then();
  container.addEventListener('controllerchange', listener, { once: true });
  return () => container.removeEventListener('controllerchange', listener);
}
