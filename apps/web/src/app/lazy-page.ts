import { lazy, type ComponentType } from 'react';

/**
 * A page whose code loads when it is first shown (its own chunk, not the first screen's), from a
 * module's named export: `lazyPage(() => import('./routes/trials'), 'TrialsRoute')`. The page's
 * RouteBoundary shows it loading, and a failed load (a stale chunk after a redeploy) reloads once.
 */
export function lazyPage<Module, Name extends keyof Module>(load: () => Promise<Module>, name: Name) {
  const Page = lazy(() => load().then((module) => ({ default: module[name] as ComponentType })));
  // preload(): fetch the page's code now (e.g. while its data loads); a failure is left to the real load to report.
  return Object.assign(Page, { preload: () => void load().catch(() => undefined) });
}
