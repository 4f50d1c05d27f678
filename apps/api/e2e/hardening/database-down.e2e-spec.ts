import { createServer, Socket, type Server } from 'node:net';
import { setTimeout as sleep } from 'node:timers/promises';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { bearer, createPerson, createTestApp, tokenFor, type TestApp } from '../support/test-app';

/**
 * A TCP relay between one test app and the test database, so this file can stop or freeze "the
 * database" for its own app without disturbing any other suite: `closed` drops every connection
 * and refuses new ones (a stopped server), `frozen` keeps the connections but passes no byte (a
 * paused server, SIGSTOP), `open` relays again (what was held flows on, as after SIGCONT).
 */
class DatabaseRelay {
  private readonly server: Server;
  private readonly pairs = new Set<[Socket, Socket]>();
  mode: 'open' | 'frozen' | 'closed' = 'open';

  constructor(private readonly target: { host: string; port: number }) {
    this.server = createServer((client) => {
      if (this.mode === 'closed') return client.destroy();
      const upstream = new Socket();
      upstream.connect(this.target.port, this.target.host);
      const pair: [Socket, Socket] = [client, upstream];
      this.pairs.add(pair);
      client.pipe(upstream);
      upstream.pipe(client);
      if (this.mode === 'frozen') this.freezePair(pair);
      const forget = () => {
        this.pairs.delete(pair);
        client.destroy();
        upstream.destroy();
      };
      client.on('error', forget).on('close', forget);
      upstream.on('error', forget).on('close', forget);
    });
  }

  private freezePair([client, upstream]: [Socket, Socket]) {
    client.pause();
    upstream.pause();
  }

  listen(): Promise<number> {
    return new Promise((resolve) => this.server.listen(0, '127.0.0.1', () => resolve((this.server.address() as { port: number }).port)));
  }

  set(mode: DatabaseRelay['mode']) {
    this.mode = mode;
    for (const pair of this.pairs) {
      if (mode === 'closed') pair.forEach((socket) => socket.destroy());
      else if (mode === 'frozen') this.freezePair(pair);
      else pair.forEach((socket) => socket.resume());
    }
  }

  close(): Promise<void> {
    this.set('closed');
    return new Promise((resolve) => this.server.close(() => resolve()));
  }
}

/** Calls until the predicate holds (at most `seconds`), returning the last response. */
async function until<T>(call: () => Promise<T>, holds: (value: T) => boolean, seconds = 10): Promise<T> {
  const deadline = Date.now() + seconds * 1000;
  let value = await call();
  while (!holds(value) && Date.now() < deadline) {
    await sleep(100);
    value = await call();
  }
  return value;
}

describe('failing well when the database goes away, and coming back without a restart', () => {
  let relay: DatabaseRelay;
  let t: TestApp;
  let token: string;
  const saved: Record<string, string | undefined> = {};

  beforeAll(async () => {
    relay = new DatabaseRelay({ host: process.env.DB_HOST ?? '127.0.0.1', port: Number(process.env.DB_PORT) });
    const port = await relay.listen();
    for (const name of ['DB_PORT', 'DB_SOCKET_TIMEOUT_MS']) saved[name] = process.env[name];
    process.env.DB_PORT = String(port);
    // A query already sent to a frozen server gives up after this long (the default is a minute).
    process.env.DB_SOCKET_TIMEOUT_MS = '3000';
    try {
      t = await createTestApp();
    } finally {
      for (const [name, value] of Object.entries(saved)) {
        if (value === undefined) delete process.env[name];
        else process.env[name] = value;
      }
    }
    token = await tokenFor(t, await createPerson({ name: 'Patient person' }));
  });
  afterAll(async () => {
    await t.close();
    await relay.close();
  });

  const trials = () => t.http.get('/api/trials').set(bearer(token));

  it('answers normally while the database is there', async () => {
    expect((await trials()).status).toBe(200);
    expect((await t.http.get('/api/health')).body).toEqual({ status: 'ok', database: 'up' });
  });

  it('database stopped: 503 with Retry-After within a second, in words; back to 200 when it returns, no restart', async () => {
    relay.set('closed');
    const started = Date.now();
    const refused = await trials();
    const elapsed = Date.now() - started;
    expect(refused.status).toBe(503);
    expect(elapsed).toBeLessThan(1_000);
    expect(refused.headers['retry-after']).toBe('5');
    expect(refused.body).toEqual({
      statusCode: 503,
      error: 'Service Unavailable',
      message: 'The database cannot be reached just now, so nothing was read or saved. Please try again in a few seconds.',
    });
    const health = await t.http.get('/api/health');
    expect(health.status).toBe(503);
    expect(health.headers['retry-after']).toBe('5');
    relay.set('open');
    expect((await until(trials, (response) => response.status === 200)).status).toBe(200);
  });

  it('database frozen (paused): new requests get 503 with Retry-After within a second once it is noticed; back when it thaws', async () => {
    relay.set('frozen');
    const noticed = await until(() => t.http.get('/api/health'), (response) => response.status === 503, 5);
    expect(noticed.status).toBe(503);
    const started = Date.now();
    const refused = await trials();
    expect(refused.status).toBe(503);
    expect(Date.now() - started).toBeLessThan(1_000);
    expect(refused.headers['retry-after']).toBe('5');
    relay.set('open');
    expect((await until(trials, (response) => response.status === 200)).status).toBe(200);
    expect((await t.http.get('/api/health')).status).toBe(200);
  });
});
