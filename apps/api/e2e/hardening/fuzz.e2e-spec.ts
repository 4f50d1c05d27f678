import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createOpenApiDocument } from '../../src/bootstrap';
import { buildIntakeTrial, intakePath, upload, type IntakeTrial } from '../intake/intake-support';
import { bearer, createPerson, createTestApp, tokenFor, type TestApp } from '../support/test-app';
import { databaseFingerprint, hostileFile, hostilePathValue, hostileQueryValue, jsonBody, routesOf, rowWrites, type FuzzBody, type FuzzRoute } from './fuzz-support';

// Random and adversarial requests to every route of the OpenAPI document (so a new route is fuzzed
// without anyone listing it): no answer may be a 5xx, and a refused request may not change the
// database, and no poisoned request (a NUL, a number or shape out of bounds, a path value that is no
// id) may be taken. FUZZ_RUNS deepens a run (40 runs clean before commit), FUZZ_SEED changes it, and
// FUZZ_DEBUG=1 prints how often each route answered what.
const RUNS = Number(process.env.FUZZ_RUNS ?? 8);
const SEED = process.env.FUZZ_SEED === undefined ? 20261214 : Number(process.env.FUZZ_SEED);

interface Caller {
  readonly name: string;
  readonly headers: Record<string, string>;
}

interface FuzzRequest {
  readonly path: string;
  readonly query: Record<string, string>;
  readonly body: FuzzBody | { file: Buffer; mapping: string | null } | null;
  readonly caller: Caller;
}

/** Poisoned: a value no route may take (a NUL, a shape or number out of bounds, a path value that is no id, a file that is no CSV or image). */
function isPoisoned(request: FuzzRequest, pathWasHostile: boolean): boolean {
  if (pathWasHostile) return true;
  if (request.body === null) return false;
  return 'file' in request.body ? true : request.body.poisoned;
}

describe('fuzz: every route survives random and hostile requests', () => {
  let t: TestApp;
  let built: IntakeTrial;
  let routes: FuzzRoute[];
  let callers: Caller[];
  const realIds: Record<string, string> = {};
  const statuses: string[] = [];

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildIntakeTrial(t);
    const csv = 'plot label,drain time (s),crumble score,water retained (mL)\nTG-B1-P01,12.50,3,120\n';
    const uploaded = await upload(t, built.tokens.collaborator, intakePath(built), Buffer.from(csv), 'day0.csv');
    if (uploaded.status !== 200) throw new Error(JSON.stringify(uploaded.body));
    const admin = await createPerson({ isAdmin: true, name: 'Fuzz administrator' });
    callers = [
      { name: 'investigator', headers: bearer(built.tokens.investigator) },
      { name: 'collaborator', headers: bearer(built.tokens.collaborator) },
      { name: 'administrator', headers: bearer(await tokenFor(t, admin)) },
      { name: 'nobody', headers: {} },
    ];
    const observations = await t.http.get(`/api/trials/${built.trialId}/observations`).set(bearer(built.tokens.investigator));
    Object.assign(realIds, {
      trialId: String(built.trialId),
      siteId: String(built.siteId),
      roundId: String(built.roundId),
      measureId: String(built.measures.DT),
      plotId: String(built.plots['TG-B1-P01']),
      observationId: String(observations.body[0].id),
      userId: String(built.ids.collaborator),
      id: String(built.measures.WR),
    });
    routes = routesOf(createOpenApiDocument(t.app));
  });
  afterAll(() => t.close());

  it('finds the routes in the OpenAPI document (not a hand-written list)', () => {
    expect(routes.length).toBeGreaterThan(60);
    expect(routes.map((r) => r.label)).toEqual(
      expect.arrayContaining(['POST /api/auth/login', 'PATCH /api/trials/{trialId}/observations/{observationId}', 'POST /api/stats/anova', 'POST /api/trials/{trialId}/sites/{siteId}/rounds/{roundId}/intake']),
    );
  });

  /** A request of one route: path values (real ids only where the request is refused anyway), query, body, caller. */
  function requestOf(route: FuzzRoute): fc.Arbitrary<FuzzRequest & { hostilePath: boolean }> {
    const refusedAnyway = route.body !== null;
    const hostile = hostilePathValue.map((value) => ({ value, hostile: true }));
    const pathValue = (name: string) =>
      (refusedAnyway || route.method === 'get') && realIds[name] ? fc.oneof({ weight: 3, arbitrary: fc.constant({ value: realIds[name]!, hostile: false }) }, { weight: 1, arbitrary: hostile }) : hostile;
    return fc.record({
      pathValues: fc.tuple(...route.pathParams.map(pathValue)),
      query: fc.dictionary(route.queryParams.length > 0 ? fc.oneof({ weight: 4, arbitrary: fc.constantFrom(...route.queryParams) }, { weight: 1, arbitrary: fc.constant('unknown') }) : fc.constant('unknown'), hostileQueryValue, { maxKeys: route.queryParams.length > 0 ? 3 : 1 }),
      body:
        route.body === 'json'
          ? jsonBody(route.bodyFields)
          : route.body === 'multipart'
            ? fc.record({ file: hostileFile, mapping: fc.option(hostileQueryValue) })
            : fc.constant(null),
      caller: fc.constantFrom(...callers),
    }).map(({ pathValues, ...rest }) => ({
      ...rest,
      path: route.pathParams.reduce((path, name, index) => path.replace(`{${name}}`, pathValues[index]!.value), route.path),
      hostilePath: pathValues.some((value) => value.hostile),
    }));
  }

  async function send(route: FuzzRoute, request: FuzzRequest) {
    let pending = t.http[route.method](request.path).query(request.query).set(request.caller.headers);
    const body = request.body;
    if (body && 'file' in body) {
      if (body.mapping !== null) pending = pending.field('mapping', body.mapping);
      pending = pending.attach('file', body.file, { filename: 'fuzz.csv', contentType: 'text/csv' });
    } else if (body && 'raw' in body) pending = pending.set('Content-Type', 'application/json').send(body.raw);
    else if (body) pending = pending.set('Content-Type', 'application/json').send(JSON.stringify(body.value) ?? 'null');
    return pending;
  }

  it(`answers no request with a 5xx, takes no poisoned one, and writes nothing for a refused one (${RUNS} requests a route)`, async () => {
    const findings: string[] = [];
    let fingerprint = await databaseFingerprint(t.sequelize);
    for (const [index, route] of routes.entries()) {
      await fc.assert(
        fc.asyncProperty(requestOf(route), async (request) => {
          const writesBefore = await rowWrites(t.sequelize);
          const response = await send(route, request);
          if (process.env.FUZZ_DEBUG) statuses.push(`${response.status} ${route.label}`);
          const where = `${route.label} as ${request.caller.name}: ${request.path} ${JSON.stringify(request.query).slice(0, 200)} ${JSON.stringify(request.body)?.slice(0, 300)}`;
          if (response.status >= 500) throw new Error(`${response.status} from ${where}: ${JSON.stringify(response.body).slice(0, 300)}`);
          if (response.status < 400 && isPoisoned(request, request.hostilePath)) throw new Error(`took a poisoned request with ${response.status}: ${where}`);
          // The checksum of every table only when InnoDB counted a row written (it is the slow part).
          if ((await rowWrites(t.sequelize)) === writesBefore) return;
          const after = await databaseFingerprint(t.sequelize);
          const changed = after !== fingerprint;
          fingerprint = after;
          if (response.status >= 400 && changed) throw new Error(`refused with ${response.status} but changed the database: ${where}`);
        }),
        { numRuns: RUNS, seed: SEED + index, endOnFailure: true },
      ).catch((error: Error) => {
        // fast-check's report holds the whole counterexample (5000 brackets, say): keep the sentence and the seed.
        const cause = error.cause instanceof Error ? error.cause.message : (/Got error: (.*)/.exec(error.message)?.[1] ?? error.message.split('\n')[0]);
        const seed = /seed: (-?\d+)/.exec(error.message)?.[1];
        findings.push(`${cause!.slice(0, 600)} (fast-check seed ${seed ?? SEED + index})`);
      });
    }
    if (process.env.FUZZ_DEBUG) {
      const counts: Record<string, number> = {};
      for (const entry of statuses) counts[entry] = (counts[entry] ?? 0) + 1;
      console.log(Object.entries(counts).sort().map(([k, v]) => `${v}\t${k}`).join('\n'));
    }
    expect(findings).toEqual([]);
  }, 600_000);
});
