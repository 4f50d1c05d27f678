import type { RequestHandler } from 'express';
import helmet from 'helmet';
import { createHash } from 'node:crypto';

const sha256 = (text: string) => `'sha256-${createHash('sha256').update(text, 'utf8').digest('base64')}'`;

/**
 * The only inline styles the app may use, each by its hash: nothing else inline is allowed, and
 * no inline script at all. React, Blueprint and Plotly set most styles through the CSSOM
 * (`element.style.x = …`, `sheet.insertRule`), which CSP does not govern; these few are written as
 * markup by the libraries. `npm test`'s browser test loads every page under this policy and fails
 * on any violation, naming the hash a library upgrade would need here.
 */
export const ALLOWED_INLINE_STYLES: ReadonlyArray<{ readonly why: string; readonly source: string }> = Object.freeze([
  // Plotly appends an empty <style id="plotly.js-style-global"> and fills it through the CSSOM.
  { why: 'Plotly: its empty global <style>, filled by insertRule', source: sha256('') },
  // @blueprintjs/table's ResizeSensor (the Ledger grid) writes its probe <div>s with innerHTML.
  { why: 'Blueprint Table resize sensor', source: sha256('position: absolute; left: 0; top: 0; right: 0; bottom: 0; overflow: hidden; z-index: -1; visibility: hidden;') },
  { why: 'Blueprint Table resize sensor', source: sha256('position: absolute; left: 0; top: 0; transition: 0s;') },
  { why: 'Blueprint Table resize sensor', source: sha256('position: absolute; left: 0; top: 0; transition: 0s; width: 200%; height: 200%;') },
  // Plotly writes <b> in chart text (the significance letters) as a tspan with this style attribute.
  { why: 'Plotly: bold chart text', source: sha256('font-weight:bold') },
  // plotly.js-dist-min 4.1.2 injects the map library's stylesheet when it loads (Friable draws no
  // maps; allowed so that a real violation stands out). Its text is long, so its hash is written here.
  { why: 'Plotly: bundled map stylesheet (plotly.js-dist-min 4.1.2)', source: "'sha256-2GF9hCGTDj/GGFNlQA54jDdMGl2fvoeZmZjAvBSiAtM='" },
]);

/**
 * The Content-Security-Policy of the app and the API (docs/operations.md explains it).
 * - scripts only from this origin: Vite's build has no inline script, and Plotly's SVG charts
 *   need no eval (its WebGL traces would; Friable uses none);
 * - styles from this origin and the inline styles listed above ('unsafe-hashes' lets a hash match
 *   a style attribute, not only a <style> element);
 * - images from this origin, data: (Blueprint's CSS icons) and blob: (plot photos fetched with the
 *   session and shown from memory); fonts from this origin and data: (small ones inlined by Vite);
 * - requests to this origin only; no plugins, no <base>, forms post here; never framed.
 */
export const CONTENT_SECURITY_POLICY: Readonly<Record<string, readonly string[]>> = Object.freeze({
  'default-src': ["'self'"],
  'script-src': ["'self'"],
  'style-src': ["'self'", "'unsafe-hashes'", ...new Set(ALLOWED_INLINE_STYLES.map((style) => style.source))],
  'img-src': ["'self'", 'data:', 'blob:'],
  'font-src': ["'self'", 'data:'],
  'connect-src': ["'self'"],
  'worker-src': ["'self'"],
  'manifest-src': ["'self'"],
  'object-src': ["'none'"],
  'base-uri': ["'none'"],
  'form-action': ["'self'"],
  'frame-ancestors': ["'none'"],
});

/** The policy of the OpenAPI page (served only when API_DOCS_PUBLIC=true): its UI needs inline styles and data: images. */
const DOCS_POLICY = { ...CONTENT_SECURITY_POLICY, 'style-src': ["'self'", "'unsafe-inline'"], 'img-src': ["'self'", 'data:'] };

/** The policy of a file served as a download (plot photos): nothing runs or loads, even if opened inline. */
export const DOWNLOAD_POLICY = "default-src 'none'; sandbox";

const headersWith = (policy: Readonly<Record<string, readonly string[]>>) =>
  helmet({
    contentSecurityPolicy: { useDefaults: false, directives: Object.fromEntries(Object.entries(policy).map(([name, values]) => [name, [...values]])) },
    frameguard: { action: 'deny' },
    referrerPolicy: { policy: 'no-referrer' },
    // Helmet's defaults besides: nosniff, HSTS (browsers honour it only over HTTPS), no DNS prefetch,
    // cross-origin opener and resource policies of this origin, no X-Powered-By.
  });

/** Security headers on every answer (helmet): the policy above, nosniff, no framing, no referrer. */
export function securityHeaders(): RequestHandler {
  const app = headersWith(CONTENT_SECURITY_POLICY);
  const docs = headersWith(DOCS_POLICY);
  return (request, response, next) => (request.path.startsWith('/api/docs') ? docs : app)(request, response, next);
}
