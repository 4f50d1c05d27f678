import type { RequestHandler } from 'express';
import helmet from 'helmet';

/**
 * SHA-256 of the empty string. Plotly adds its chart rules through an empty <style> element
 * (`plotly.js-style-global`) and then the CSSOM (`sheet.insertRule`), which CSP does not govern; the
 * element itself is inline style, allowed by this hash because it is empty when inserted. Nothing
 * else inline is allowed: no inline scripts at all, no other inline style.
 */
export const EMPTY_INLINE_STYLE = "'sha256-47DEQpj8HBSa+/TImW+5JCeuQeRkm5NMpJWZG3hSuFU='";

/**
 * The Content-Security-Policy of the app and the API (see docs/operations.md for why each part).
 * - scripts only from this origin (Vite's build has no inline script; Plotly's SVG charts need no eval);
 * - styles from this origin, plus the empty <style> Plotly fills through the CSSOM (React, Blueprint
 *   and Plotly set element styles through the CSSOM too, which CSP leaves alone);
 * - images from this origin, data: (Blueprint's CSS icons) and blob: (plot photos fetched with the
 *   session and shown from memory); fonts from this origin and data: (inlined by Vite);
 * - requests to this origin only; no plugins, no <base>, forms post here; never framed.
 */
export const CONTENT_SECURITY_POLICY: Readonly<Record<string, readonly string[]>> = Object.freeze({
  'default-src': ["'self'"],
  'script-src': ["'self'"],
  'style-src': ["'self'", EMPTY_INLINE_STYLE],
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

/** The policy of the OpenAPI page (only served when API_DOCS_PUBLIC=true): its UI needs inline styles and data: images. */
const DOCS_POLICY = { ...CONTENT_SECURITY_POLICY, 'style-src': ["'self'", "'unsafe-inline'"], 'img-src': ["'self'", 'data:'] };

/** A policy for a file served as a download (plot photos): nothing runs or loads, even if opened inline. */
export const DOWNLOAD_POLICY = "default-src 'none'; sandbox";

const headersWith = (policy: Record<string, readonly string[]>) =>
  helmet({
    contentSecurityPolicy: { useDefaults: false, directives: Object.fromEntries(Object.entries(policy).map(([name, values]) => [name, [...values]])) },
    frameguard: { action: 'deny' },
    referrerPolicy: { policy: 'no-referrer' },
    // Helmet's defaults besides: nosniff, HSTS (browsers honour it only over HTTPS), no DNS prefetch,
    // cross-origin opener and resource policies of this origin, no X-Powered-By.
  });

/** Security headers for every answer (helmet): the policy above, nosniff, no framing, no referrer. */
export function securityHeaders(): RequestHandler {
  const app = headersWith(CONTENT_SECURITY_POLICY);
  const docs = headersWith(DOCS_POLICY);
  return (request, response, next) => (request.path.startsWith('/api/docs') ? docs : app)(request, response, next);
}
