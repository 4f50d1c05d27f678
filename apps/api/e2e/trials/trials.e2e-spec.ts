import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Trial } from '../../src/trials/models/trial.model';
import { TrialMembership } from '../../src/trials/models/trial-membership.model';
import { bearer, createPerson, createTestApp, tokenFor, type TestApp, patchCurrent } from '../support/test-app';

const uniqueCode = () => `T-${Math.random().toString(36).slice(2, 10).toUpperCase()}`;

describe('trials and per-trial roles', () => {
  let t: TestApp;
  let investigatorToken: string;
  let reviewerToken: string;
  let outsiderToken: string;
  let adminToken: string;
  let trialId: number;
  let code: string;

  beforeAll(async () => {
    t = await createTestApp();
    investigatorToken = await tokenFor(t, await createPerson({ name: 'Lead' }));
    const reviewer = await createPerson({ name: 'Reader' });
    reviewerToken = await tokenFor(t, reviewer);
    outsiderToken = await tokenFor(t, await createPerson({ name: 'Outsider' }));
    adminToken = await tokenFor(t, await createPerson({ isAdmin: true }));
    code = uniqueCode();
    const created = await t.http.post('/api/trials').set(bearer(investigatorToken)).send({ code: code.toLowerCase(), title: 'Compost on clay', design: 'rcbd' });
    expect(created.status).toBe(201);
    trialId = created.body.id;
    await TrialMembership.create({ trialId, userId: reviewer.id, role: 'reviewer', siteId: null });
  });
  afterAll(() => t.close());

  it('creates a draft trial whose creator is its investigator', async () => {
    const row = await Trial.findByPk(trialId);
    expect(row).toMatchObject({ code, title: 'Compost on clay', design: 'rcbd', status: 'draft' });
    const roles = await TrialMembership.findAll({ where: { trialId } });
    expect(roles.map((r) => r.role).sort()).toEqual(['investigator', 'reviewer']);
  });

  it('lists only the trials a person holds a role on, with their roles', async () => {
    const mine = await t.http.get('/api/trials').set(bearer(reviewerToken));
    expect(mine.status).toBe(200);
    expect(mine.body).toEqual([expect.objectContaining({ id: trialId, code, title: 'Compost on clay', design: 'rcbd', status: 'draft', myRoles: ['reviewer'] })]);
    const outsider = await t.http.get('/api/trials').set(bearer(outsiderToken));
    expect(outsider.body.find((trial: { id: number }) => trial.id === trialId)).toBeUndefined();
  });

  it('lets the investigator change the title and refuses a reviewer with 403', async () => {
    const byReviewer = await patchCurrent(t, `/api/trials/${trialId}`, bearer(reviewerToken), { title: 'Reviewer was here' });
    expect(byReviewer.status).toBe(403);
    expect(byReviewer.body.message).toBe('This needs the investigator role on this trial; you are reviewer.');
    expect((await Trial.findByPk(trialId))?.title).toBe('Compost on clay');

    const byLead = await patchCurrent(t, `/api/trials/${trialId}`, bearer(investigatorToken), { title: 'Compost and gypsum on clay' });
    expect(byLead.status).toBe(200);
    expect((await Trial.findByPk(trialId))?.title).toBe('Compost and gypsum on clay');
  });

  it('answers a non-member with 404, as if the trial did not exist', async () => {
    const read = await t.http.get(`/api/trials/${trialId}`).set(bearer(outsiderToken));
    const write = await patchCurrent(t, `/api/trials/${trialId}`, bearer(outsiderToken), { title: 'Nope' });
    const missing = await t.http.get('/api/trials/999999999').set(bearer(outsiderToken));
    for (const response of [read, write, missing]) {
      expect(response.status).toBe(404);
      expect(response.body.message).toBe('No such trial.');
    }
  });

  it('lets an instance administrator read every trial but not change one', async () => {
    const list = await t.http.get('/api/trials').set(bearer(adminToken));
    expect(list.body.find((trial: { id: number }) => trial.id === trialId)).toMatchObject({ myRoles: [] });
    const read = await t.http.get(`/api/trials/${trialId}`).set(bearer(adminToken));
    expect(read.status).toBe(200);
    const write = await patchCurrent(t, `/api/trials/${trialId}`, bearer(adminToken), { title: 'Admin edit' });
    expect(write.status).toBe(403);
  });

  it('answers a second trial with the same code with 409 and validates the body', async () => {
    const duplicate = await t.http.post('/api/trials').set(bearer(investigatorToken)).send({ code, title: 'Again' });
    expect(duplicate.status).toBe(409);
    const bad = await t.http.post('/api/trials').set(bearer(investigatorToken)).send({ code: 'no spaces allowed', title: 'x', design: 'latin-square' });
    expect(bad.status).toBe(422);
    expect(bad.body.errors.map((e: { field: string }) => e.field).sort()).toEqual(['code', 'design', 'title']);
  });
});
