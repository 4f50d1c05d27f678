import { Test } from '@nestjs/testing';
import type { NestExpressApplication } from '@nestjs/platform-express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AppModule } from '../../src/app.module';
import { configureApp } from '../../src/bootstrap';
import { ObservationsGuardService } from '../../src/protocol-gate/observations-guard.service';
import { MeasureRow } from '../../src/measures/models/measure.model';
import { PlotRow } from '../../src/plots/models/plot.model';
import { TreatmentRow } from '../../src/treatments/models/treatment.model';
import { Trial } from '../../src/trials/models/trial.model';
import { bearer, type TestApp, patchCurrent } from '../support/test-app';
import { buildSmallTrial, expectStatus, type BuiltTrial } from '../protocol/protocol-builder';

/**
 * The "refuse once data exist" rules. The observations table arrives with data intake; here the
 * ObservationsGuardService is replaced by a stub that reports observations at chosen sites, so
 * the rules are exercised through the real routes now.
 */
describe('edits refused once a site holds observations (stubbed observations)', () => {
  let t: TestApp;
  let app: NestExpressApplication;
  const observedSites = new Set<number>();
  let built: BuiltTrial;
  let auth: { Authorization: string };
  let base: string;
  let siteId: number;

  beforeAll(async () => {
    const stub = {
      sitesWithObservations: async (_trialId: number, siteIds?: number[]) => [...observedSites].filter((id) => !siteIds || siteIds.includes(id)),
      trialHasObservations: async () => observedSites.size > 0,
      siteHasObservations: async (_trialId: number, id: number) => observedSites.has(id),
    };
    const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).overrideProvider(ObservationsGuardService).useValue(stub).compile();
    app = configureApp(moduleRef.createNestApplication<NestExpressApplication>({ logger: ['error'], bodyParser: false }));
    await app.init();
    t = { app, http: request(app.getHttpServer()), sequelize: undefined as never, close: () => app.close() };
    built = await buildSmallTrial(t);
    auth = bearer(built.token);
    base = `/api/trials/${built.trialId}`;
    siteId = built.sites['Test Garden'];
    await expectStatus(patchCurrent(t, base, auth, { status: 'active' }), 200);
    observedSites.add(siteId);
  });
  afterAll(() => app.close());

  it('reports the site as holding observations', async () => {
    const sites = (await t.http.get(`${base}/sites`).set(auth)).body;
    expect(sites[0]).toMatchObject({ id: siteId, hasObservations: true });
  });

  it.each([
    ['re-randomizing the site', 'post', () => `${base}/sites/${siteId}/randomize`, { seed: 'new' }, 'Re-randomizing Test Garden is refused: Test Garden already has observations, whose meaning it would change.'],
    ['adding a treatment', 'post', () => `${base}/treatments`, { code: 'NEW', name: 'New' }, 'Adding treatment NEW is refused: Test Garden already has observations, whose meaning it would change.'],
    ['deleting a measured treatment', 'delete', () => `${base}/treatments/${built.treatments.G}`, undefined, 'Deleting treatment G is refused: Test Garden already has observations, whose meaning it would change.'],
    ["changing a measure's unit", 'patch', () => `${base}/measures/${built.measures.DT}`, { unit: 'min' }, 'Changing the unit of measure DT is refused: Test Garden already has observations, whose meaning it would change.'],
    ["changing the site's blocks", 'patch', () => `${base}/sites/${siteId}`, { blocks: 6 }, 'Changing the blocks of Test Garden from 4 to 6 is refused: Test Garden already has observations, whose meaning it would change.'],
    ['deleting the site', 'delete', () => `${base}/sites/${siteId}`, undefined, 'Deleting site Test Garden is refused: Test Garden already has observations, whose meaning it would change.'],
    ['going back to draft', 'patch', () => base, { status: 'draft' }, 'This trial already holds observations, so it cannot go back to draft; lock it instead.'],
  ] as const)('refuses %s with 409 and writes nothing', async (_name, method, path, body, message) => {
    const before = { plots: await PlotRow.count({ where: { trialId: built.trialId } }), treatments: await TreatmentRow.count({ where: { trialId: built.trialId } }) };
    // A PATCH carries the version just read, so that only the meaning of the stored values stops it.
    const pending = method === 'patch' ? patchCurrent(t, path(), auth, body) : t.http[method](path()).set(auth);
    const response = await (body && method !== 'patch' ? (pending as ReturnType<typeof t.http.post>).send(body) : pending);
    expect(response.status).toBe(409);
    expect(response.body.message).toBe(message);
    expect({ plots: await PlotRow.count({ where: { trialId: built.trialId } }), treatments: await TreatmentRow.count({ where: { trialId: built.trialId } }) }).toEqual(before);
    expect((await MeasureRow.findByPk(built.measures.DT))?.unit).toBe('s');
    expect((await Trial.findByPk(built.trialId))?.status).toBe('active');
  });

  it('still allows edits that keep the meaning of stored values', async () => {
    const renamed = await expectStatus<{ name: string }>(patchCurrent(t, `${base}/treatments/${built.treatments.G}`, auth, { name: 'Gypsum, renamed' }), 200);
    expect(renamed.name).toBe('Gypsum, renamed');
    await expectStatus(patchCurrent(t, `${base}/measures/${built.measures.DT}`, auth, { plausibleMax: 500 }), 200);
  });
});
