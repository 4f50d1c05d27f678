import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { request as httpRequest, type IncomingHttpHeaders, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { brotliCompressSync, brotliDecompressSync, gunzipSync, gzipSync } from 'node:zlib';
import { bearer, createPerson, createTestAppWith, tokenFor, type TestApp } from '../support/test-app';

// A stand-in for `npm run build -w apps/web`: the page, a hashed script with its brotli and gzip
// copies (as vite-plugin-compression2 writes them) and its source map, and an unhashed icon.
const PAGE = '<!doctype html><title>Friable</title><div id="root"></div><script type="module" src="/assets/app-4f2a9c.js"></script>';
const SCRIPT = `export const words = ${JSON.stringify(Array.from({ length: 400 }, (_, i) => `plot ${i} of the trial`))};\n`;
const ICON = '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 1 1"><rect width="1" height="1"/></svg>';

function writeBuild(): string {
  const dir = mkdtempSync(join(tmpdir(), 'friable-web-'));
  mkdirSync(join(dir, 'assets'));
  writeFileSync(join(dir, 'index.html'), PAGE);
  writeFileSync(join(dir, 'assets/app-4f2a9c.js'), SCRIPT);
  writeFileSync(join(dir, 'assets/app-4f2a9c.js.br'), brotliCompressSync(SCRIPT));
  writeFileSync(join(dir, 'assets/app-4f2a9c.js.gz'), gzipSync(SCRIPT));
  writeFileSync(join(dir, 'assets/app-4f2a9c.js.map'), JSON.stringify({ version: 3, sources: ['src/app.ts'], mappings: '' }));
  writeFileSync(join(dir, 'friable.svg'), ICON);
  return dir;
}

interface RawAnswer {
  status: number;
  headers: IncomingHttpHeaders;
  /** The bytes as sent, still compressed (supertest and fetch would decode them). */
  body: Buffer;
}

/** One request over a real socket to the app, its answer's bytes as they travelled. */
async function rawGet(t: TestApp, path: string, headers: Record<string, string>): Promise<RawAnswer> {
  const server = t.app.getHttpServer() as Server;
  if (!server.listening) await new Promise<void>((done) => server.listen(0, '127.0.0.1', done));
  const { port } = server.address() as AddressInfo;
  return new Promise((done, fail) => {
    const request = httpRequest({ host: '127.0.0.1', port, path, headers }, (response) => {
      const chunks: Buffer[] = [];
      response.on('data', (chunk: Buffer) => chunks.push(chunk));
      response.on('end', () => done({ status: response.statusCode ?? 0, headers: response.headers, body: Buffer.concat(chunks) }));
    });
    request.on('error', fail);
    request.end();
  });
}

describe('the built web app as a browser gets it', () => {
  let t: TestApp;
  let dir: string;
  beforeAll(async () => {
    dir = writeBuild();
    t = await createTestAppWith({ WEB_DIST_DIR: dir, NODE_ENV: 'production' });
  });
  afterAll(async () => {
    await t.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('a hashed script goes out as the brotli copy made at build, when the browser accepts it', async () => {
    const response = await rawGet(t, '/assets/app-4f2a9c.js', { 'Accept-Encoding': 'gzip, deflate, br' });
    expect(response.status).toBe(200);
    expect(response.headers['content-encoding']).toBe('br');
    expect(response.headers['vary']).toMatch(/Accept-Encoding/i);
    expect(response.headers['content-type']).toMatch(/^(text|application)\/javascript/);
    expect(brotliDecompressSync(response.body).toString()).toBe(SCRIPT);
    expect(response.body.length).toBeLessThan(SCRIPT.length / 3);
  });

  it('gzip for a browser without brotli, the plain file for one that accepts neither', async () => {
    const gzip = await rawGet(t, '/assets/app-4f2a9c.js', { 'Accept-Encoding': 'gzip' });
    expect(gzip.headers['content-encoding']).toBe('gzip');
    expect(gunzipSync(gzip.body).toString()).toBe(SCRIPT);
    const plain = await rawGet(t, '/assets/app-4f2a9c.js', { 'Accept-Encoding': 'identity' });
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.headers['vary']).toMatch(/Accept-Encoding/i);
    expect(plain.body.toString()).toBe(SCRIPT);
  });

  it('hashed assets are cached for a year as immutable; the page and the icon are asked for again each time', async () => {
    const script = await t.http.get('/assets/app-4f2a9c.js');
    expect(script.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    for (const path of ['/', '/trials/3/findings', '/sign-in']) {
      const page = await t.http.get(path).set('Accept', 'text/html');
      expect(page.status, path).toBe(200);
      expect(page.text, path).toBe(PAGE);
      expect(page.headers['cache-control'], path).toBe('no-cache');
    }
    const icon = await t.http.get('/friable.svg');
    expect(icon.status).toBe(200);
    expect(icon.headers['cache-control']).toBe('no-cache');
  });

  it('HEAD / is answered like GET /, without the body', async () => {
    const get = await t.http.get('/');
    const head = await t.http.head('/');
    expect(head.status).toBe(200);
    expect(head.headers['content-type']).toBe(get.headers['content-type']);
    expect(head.headers['content-length']).toBe(String(Buffer.byteLength(PAGE)));
    expect(head.headers['cache-control']).toBe('no-cache');
    expect(head.text ?? '').toBe('');
    const headAsset = await t.http.head('/assets/app-4f2a9c.js').set('Accept-Encoding', 'br');
    expect(headAsset.status).toBe(200);
    expect(headAsset.headers['content-encoding']).toBe('br');
  });

  it('source maps are not served in production', async () => {
    const response = await t.http.get('/assets/app-4f2a9c.js.map');
    expect(response.status).toBe(404);
    expect(response.body.message).toMatch(/Source maps are not served/);
    const head = await t.http.head('/assets/app-4f2a9c.js.map');
    expect(head.status).toBe(404);
  });

  it('a hashed file that is no longer there is a 404, not the page (a stale chunk after a redeploy)', async () => {
    const response = await t.http.get('/assets/findings-page-0ld0ne.js');
    expect(response.status).toBe(404);
    expect(response.headers['content-type']).toMatch(/json/);
    expect(response.body.message).toMatch(/reload the page/);
  });

  it('JSON answers of the API go out compressed', async () => {
    const admin = await createPerson({ isAdmin: true });
    for (let i = 0; i < 8; i += 1) await createPerson();
    const token = await tokenFor(t, admin);
    const br = await rawGet(t, '/api/users', { ...bearer(token), 'Accept-Encoding': 'br' });
    expect(br.status).toBe(200);
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers['vary']).toMatch(/Accept-Encoding/i);
    const people = JSON.parse(brotliDecompressSync(br.body).toString()) as Array<{ email: string }>;
    expect(people.map((person) => person.email)).toContain(admin.email);
    const gzip = await rawGet(t, '/api/users', { ...bearer(token), 'Accept-Encoding': 'gzip' });
    expect(gzip.headers['content-encoding']).toBe('gzip');
    expect(JSON.parse(gunzipSync(gzip.body).toString())).toHaveLength(people.length);
    // A small answer is not worth compressing.
    const health = await t.http.get('/api/health').set('Accept-Encoding', 'br');
    expect(health.headers['content-encoding']).toBeUndefined();
  });
});

describe('outside production', () => {
  let t: TestApp;
  let dir: string;
  beforeAll(async () => {
    dir = writeBuild();
    t = await createTestAppWith({ WEB_DIST_DIR: dir, NODE_ENV: 'test' });
  });
  afterAll(async () => {
    await t.close();
    rmSync(dir, { recursive: true, force: true });
  });

  it('source maps are served to the people developing the app', async () => {
    const response = await t.http.get('/assets/app-4f2a9c.js.map');
    expect(response.status).toBe(200);
    expect(response.body.sources).toEqual(['src/app.ts']);
  });

  it('the API routes are not answered with the page', async () => {
    const response = await t.http.get('/api/no-such-route');
    expect(response.status).toBe(404);
    expect(response.headers['content-type']).toMatch(/json/);
  });
});
