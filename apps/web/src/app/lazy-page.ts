import { lazy, type ComponentType } from 'react';

/**
 * A page whose code loads when it is first shown (its own chunk, not the first screen's), from a
 * module's named export: `lazyPage(() => import('./routes/trials'), 'TrialsRoute')`. The page's
 * RouteBoundary shows it loading, and a failed load (a stale chunk after a redeploy) reloads once.
 */
export function lazyPage<Module, Name extends keyof Module>(load: () => Promise<Module>, name: Name) {
  return lazy(() => load().then((module) => ({ default: module[name] as ComponentType })));
}
