import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOpenApiDocument } from '../../src/bootstrap';
import { buildIntakeTrial, intakePath, upload, type IntakeTrial } from '../intake/intake-support';
import { bearer, createTestApp, type TestApp } from '../support/test-app';

/** An identifier written the way code names things: a lower-case word followed by a capital ("siteId", "scaleMin"); unit symbols such as mL or kPa are not. */
const CAMEL_CASE = /\b[a-z]{2,}[A-Z][a-zA-Z0-9]*\b/;
/** A row or index counted from zero ("row 0", "index 0", "[0]"). */
const ZERO_BASED = /\b(row|line|index|item|entry)\s+0\b|\[0\]/i;

interface Operation {
  method: 'post' | 'patch' | 'put' | 'delete';
  path: string;
  properties: string[];
}

/** Wrong on purpose: the wrong type for every field there is (an object where text or a number belongs). */
const wrongTypes = (properties: string[]) => Object.fromEntries(properties.map((name) => [name, { not: 'this' }]));

describe('every error answer of the API names things as people see them', () => {
  let t: TestApp;
  let built: IntakeTrial;
  const seen: Array<{ where: string; message: string }> = [];

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildIntakeTrial(t);
  });
  afterAll(() => t.close());

  function record(where: string, body: unknown) {
    const message = (body as { message?: unknown })?.message;
    for (const text of Array.isArray(message) ? message : [message]) if (typeof text === 'string') seen.push({ where, message: text });
  }

  it('walks every route that takes a body, with an empty body and with the wrong type in every field', async () => {
    const document = JSON.parse(JSON.stringify(createOpenApiDocument(t.app))) as {
      paths: Record<string, Record<string, { requestBody?: { content?: Record<string, { schema?: { $ref?: string } }> } }>>;
      components: { schemas: Record<string, { properties?: Record<string, unknown> }> };
    };
    const operations: Operation[] = [];
    for (const [path, methods] of Object.entries(document.paths)) {
      for (const [method, operation] of Object.entries(methods)) {
        if (!['post', 'patch', 'put'].includes(method) || path.startsWith('/api/auth') || path.includes('/dev/')) continue;
        const reference = operation.requestBody?.content?.['application/json']?.schema?.$ref;
        if (!reference) continue;
        const schema = document.components.schemas[reference.split('/').pop()!];
        operations.push({ method: method as Operation['method'], path, properties: Object.keys(schema?.properties ?? {}) });
      }
    }
    expect(operations.length).toBeGreaterThan(20);
    const ids: Record<string, number> = { trialId: built.trialId, siteId: built.siteId, roundId: built.roundId, measureId: built.measures.DT };
    for (const operation of operations) {
      const address = operation.path.replace(/\{(\w+)\}/g, (_, name: string) => String(ids[name] ?? 1));
      for (const body of [{}, wrongTypes(operation.properties)]) {
        const response = await t.http[operation.method](address).set(bearer(built.tokens.investigator)).send(body);
        if (response.status >= 400 && response.status < 500) record(`${operation.method.toUpperCase()} ${operation.path}`, response.body);
      }
    }
    // The walk did meet refusals to judge: every body-taking route refuses an empty or mistyped body somewhere.
    expect(seen.length).toBeGreaterThan(operations.length);
  }, 120_000);

  it('walks every route that reads choices from its address, with a wrong value in each', async () => {
    const document = JSON.parse(JSON.stringify(createOpenApiDocument(t.app))) as {
      paths: Record<string, Record<string, { parameters?: Array<{ in: string; name: string }> }>>;
    };
    const ids: Record<string, number> = { trialId: built.trialId, siteId: built.siteId, roundId: built.roundId, measureId: built.measures.DT };
    let routes = 0;
    for (const [path, methods] of Object.entries(document.paths)) {
      const operation = methods.get;
      const names = (operation?.parameters ?? []).filter((p) => p.in === 'query').map((p) => p.name);
      if (!operation || names.length === 0 || path.startsWith('/api/auth') || path.includes('/dev/')) continue;
      routes += 1;
      const address = path.replace(/\{(\w+)\}/g, (_, name: string) => String(ids[name] ?? 1));
      for (const name of names) {
        const response = await t.http.get(address).query({ measureId: built.measures.DT, [name]: 'not-this' }).set(bearer(built.tokens.investigator));
        if (response.status >= 400 && response.status < 500) record(`GET ${path}?${name}`, response.body);
      }
    }
    expect(routes).toBeGreaterThan(5);
    expect(seen.some(({ where }) => where.includes('/findings?'))).toBe(true);
  }, 120_000);

  it('counts an upload’s rows as people do: the first row under the header is row 2 of the file', async () => {
    const csv = 'plot label,drain time (s)\nTG-B1-P01,abc\n';
    const response = await upload(t, built.tokens.collaborator, intakePath(built), Buffer.from(csv), 'bad.csv');
    expect(response.status).toBeGreaterThanOrEqual(400);
    const text = JSON.stringify(response.body);
    expect(text).not.toMatch(ZERO_BASED);
    record('intake upload', response.body);
  });

  it('no message names a field the way code does, or counts from zero', () => {
    const wrong = seen.filter(({ message }) => CAMEL_CASE.test(message) || ZERO_BASED.test(message)).map(({ where, message }) => `${where}: ${message}`);
    expect([...new Set(wrong)]).toEqual([]);
  });
});
