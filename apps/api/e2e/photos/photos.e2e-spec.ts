import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildIntakeTrial, rowCounts, type IntakeTrial } from '../intake/intake-support';
import { bearer, createTestApp, type TestApp, patchCurrent } from '../support/test-app';

const photo = (name: string) => readFileSync(resolve(__dirname, 'fixtures', name));

describe('Plot photos', () => {
  let t: TestApp;
  let built: IntakeTrial;
  let path: (plot: string) => string;

  beforeAll(async () => {
    t = await createTestApp();
    built = await buildIntakeTrial(t);
    path = (plot) => `/api/trials/${built.trialId}/plots/${built.plots[plot]}/rounds/${built.roundId}/photo`;
  });
  afterAll(() => t.close());

  const put = (token: string, plot: string, bytes: Buffer, filename: string) => t.http.put(path(plot)).set(bearer(token)).attach('file', bytes, { filename, contentType: 'image/png' });

  it('keeps a JPEG named .png as the JPEG it is, and gives it back', async () => {
    const jpeg = photo('jpeg-markers.jpg');
    const response = await put(built.tokens.collaborator, 'TG-B1-P01', jpeg, 'actually-a-jpeg.png');
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ plotId: built.plots['TG-B1-P01'], roundId: built.roundId, contentType: 'image/jpeg', sizeBytes: jpeg.length, uploadedById: built.ids.collaborator });
    const back = await t.http.get(path('TG-B1-P01')).set(bearer(built.tokens.reviewer)).buffer(true).parse((res, done) => {
      const parts: Buffer[] = [];
      res.on('data', (part: Buffer) => parts.push(part));
      res.on('end', () => done(null, Buffer.concat(parts)));
    });
    expect(back.status).toBe(200);
    expect(back.headers['content-type']).toBe('image/jpeg');
    expect(Buffer.compare(back.body as Buffer, jpeg)).toBe(0);
  });

  it('replaces the photo with a PNG, recording both in the Activity log', async () => {
    const response = await put(built.tokens.investigator, 'TG-B1-P01', photo('tiny.png'), 'bed.png');
    expect(response.status).toBe(200);
    expect(response.body.contentType).toBe('image/png');
    const rows = await t.sequelize.query<{ n: number }>('SELECT COUNT(*) AS n FROM plot_photos WHERE plot_id = ?', { replacements: [built.plots['TG-B1-P01']], type: QueryTypes.SELECT });
    expect(Number(rows[0]!.n)).toBe(1);
    const log = await t.http.get(`/api/trials/${built.trialId}/activity?siteId=${built.siteId}`).set(bearer(built.tokens.reviewer));
    expect(log.body.filter((a: { kind: string }) => a.kind.startsWith('photo.')).map((a: { summary: string }) => a.summary)).toEqual([
      'Replaced the photo of TG-B1-P01, Day 0.',
      'Added a photo of TG-B1-P01, Day 0.',
    ]);
  });

  it('refuses a text file named .jpg with 422, writing nothing', async () => {
    const before = await rowCounts(t.sequelize, built.trialId);
    const response = await put(built.tokens.investigator, 'TG-B1-P02', Buffer.from('plot label,drain time\n'), 'photo.jpg');
    expect(response.status).toBe(422);
    expect(response.body.message).toBe('The file is not a JPEG or PNG image (checked from its content, not its name). Send a photo in one of those formats.');
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
    expect((await t.http.get(path('TG-B1-P02')).set(bearer(built.tokens.investigator))).status).toBe(404);
  });

  it('refuses a photo over PHOTO_MAX_BYTES (8 MB by default) with 413', async () => {
    const big = Buffer.concat([photo('jpeg-markers.jpg'), Buffer.alloc(8 * 1_048_576)]);
    const response = await put(built.tokens.investigator, 'TG-B1-P02', big, 'big.jpg');
    expect(response.status).toBe(413);
    expect(response.body.message).toBe('The file is larger than 8 MB, the most accepted for a photo. Split it or make it smaller.');
  });

  it('permissions: another site 403, reviewer 403, non-member 404; nothing written', async () => {
    const before = await rowCounts(t.sequelize, built.trialId);
    expect((await put(built.tokens.collaborator, 'OG-B1-P01', photo('tiny.png'), 'x.png')).status).toBe(403);
    expect((await put(built.tokens.reviewer, 'TG-B1-P02', photo('tiny.png'), 'x.png')).status).toBe(403);
    expect((await put(built.tokens.nonMember, 'TG-B1-P02', photo('tiny.png'), 'x.png')).status).toBe(404);
    expect((await t.http.delete(path('TG-B1-P01')).set(bearer(built.tokens.reviewer))).status).toBe(403);
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
  });

  it('a locked trial refuses PUT and DELETE with 409; unlocked, DELETE removes the photo', async () => {
    const base = `/api/trials/${built.trialId}`;
    expect((await patchCurrent(t, base, bearer(built.tokens.investigator), { status: 'locked' })).status).toBe(200);
    const before = await rowCounts(t.sequelize, built.trialId);
    const putLocked = await put(built.tokens.investigator, 'TG-B1-P03', photo('tiny.png'), 'x.png');
    expect(putLocked.status).toBe(409);
    expect(putLocked.body.message).toBe('This trial is locked; unlock it to change anything.');
    expect((await t.http.delete(path('TG-B1-P01')).set(bearer(built.tokens.investigator))).status).toBe(409);
    expect(await rowCounts(t.sequelize, built.trialId)).toEqual(before);
    expect((await t.http.get(path('TG-B1-P01')).set(bearer(built.tokens.reviewer))).status).toBe(200);
    expect((await patchCurrent(t, base, bearer(built.tokens.investigator), { status: 'active' })).status).toBe(200);
    expect((await t.http.delete(path('TG-B1-P01')).set(bearer(built.tokens.collaborator))).status).toBe(204);
    expect((await t.http.get(path('TG-B1-P01')).set(bearer(built.tokens.reviewer))).status).toBe(404);
    expect((await t.http.delete(path('TG-B1-P01')).set(bearer(built.tokens.collaborator))).status).toBe(404);
  });
});
