import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildIntakeTrial, type IntakeTrial } from '../intake/intake-support';
import { bearer, createPerson, createTestApp, createTestAppWith, tokenFor, type TestApp } from '../support/test-app';

/** The directives of a Content-Security-Policy header, by name. */
function directives(header: string | undefined): Record<string, string[]> {
  return Object.fromEntries(
    (header ?? '')
      .split(';')
      .map((part) => part.trim().split(/\s+/))
      .filter((words) => words[0])
      .map(([name, ...values]) => [name!, values]),
  );
}

describe('security headers on every answer', () => {
  let t: TestApp;
  let webDir: string;

  beforeAll(async () => {
    // A stand-in for the built web app, so the page and static-file answers are checked too.
    webDir = mkdtempSync(join(tmpdir(), 'friable-web-'));
    writeFileSync(join(webDir, 'index.html'), '<!doctype html><title>Friable</title><div id="root"></div><script type="module" src="/assets/app.js"></script>');
    writeFileSync(join(webDir, 'app.js'), 'console.log(1);');
    t = await createTestAppWith({ WEB_DIST_DIR: webDir });
  });
  afterAll(async () => {
    await t.close();
    rmSync(webDir, { recursive: true, force: true });
  });

  it.each(['/api/health', '/trials/1/findings', '/app.js', '/api/no-such-route'])('%s: strict CSP, nosniff, no framing, no referrer', async (path) => {
    const response = await t.http.get(path);
    expect(response.status).toBeLessThan(500);
    const csp = directives(response.headers['content-security-policy']);
    expect(csp['default-src']).toEqual(["'self'"]);
    expect(csp['script-src']).toEqual(["'self'"]);
    expect(csp['object-src']).toEqual(["'none'"]);
    expect(csp['base-uri']).toEqual(["'none'"]);
    expect(csp['frame-ancestors']).toEqual(["'none'"]);
    expect(response.headers['content-security-policy']).not.toMatch(/unsafe-inline'[^;]*;?\s*(script|default)|unsafe-eval/);
    expect(csp['style-src']).not.toContain("'unsafe-inline'");
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['x-frame-options']).toBe('DENY');
    expect(response.headers['referrer-policy']).toBe('no-referrer');
    expect(response.headers['x-powered-by']).toBeUndefined();
  });
});

describe('plot photos are served as attachments under a sandbox', () => {
  let t: TestApp;
  let built: IntakeTrial;
  beforeAll(async () => {
    t = await createTestApp();
    built = await buildIntakeTrial(t);
  });
  afterAll(() => t.close());

  it('a PNG with a trailing script comes back as a download, never sniffed or run', async () => {
    const png = readFileSync(resolve(__dirname, '../photos/fixtures/tiny.png'));
    const booby = Buffer.concat([png, Buffer.from('<html><script>alert(document.cookie)</script></html>')]);
    const path = `/api/trials/${built.trialId}/plots/${built.plots['TG-B1-P01']}/rounds/${built.roundId}/photo`;
    const put = await t.http.put(path).set(bearer(built.tokens.collaborator)).attach('file', booby, { filename: 'bed.png', contentType: 'text/html' });
    expect(put.status).toBe(200);
    const response = await t.http.get(path).set(bearer(built.tokens.reviewer));
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toBe('image/png');
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['content-disposition']).toBe('attachment; filename="TG-B1-P01 Day 0.png"');
    const csp = directives(response.headers['content-security-policy']);
    expect(csp['default-src']).toEqual(["'none'"]);
    expect(csp.sandbox).toEqual([]);
  });
});

describe('the OpenAPI page and the development Outbox', () => {
  it('/api/docs is not served unless API_DOCS_PUBLIC=true', async () => {
    const closed = await createTestAppWith({ API_DOCS_PUBLIC: undefined });
    try {
      expect((await closed.http.get('/api/docs')).status).toBe(404);
      expect((await closed.http.get('/api/docs/openapi.json')).status).toBe(404);
    } finally {
      await closed.close();
    }
    const open = await createTestAppWith({ API_DOCS_PUBLIC: 'true' });
    try {
      const page = await open.http.get('/api/docs/');
      expect(page.status).toBe(200);
      expect(page.text).toContain('swagger-ui');
      const document = await open.http.get('/api/docs/openapi.json');
      expect(document.status).toBe(200);
      expect(Object.keys(document.body.paths)).toContain('/api/auth/login');
    } finally {
      await open.close();
    }
  });

  it('the Outbox, which holds everyone’s invitation links, is for administrators only', async () => {
    const t = await createTestApp();
    try {
      const someone = await tokenFor(t, await createPerson({ name: 'Curious member' }));
      const refused = await t.http.get('/api/dev/outbox').set(bearer(someone));
      expect(refused.status).toBe(403);
      expect(refused.body.message).toBe('Only an instance administrator may do this.');
      const admin = await tokenFor(t, await createPerson({ isAdmin: true }));
      const allowed = await t.http.get('/api/dev/outbox').set(bearer(admin));
      expect(allowed.status).toBe(200);
      expect(Array.isArray(allowed.body)).toBe(true);
    } finally {
      await t.close();
    }
  });
});
