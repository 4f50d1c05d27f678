import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { TrialMembership } from '../../src/trials/models/trial-membership.model';
import { expectStatus, uniqueCode } from '../protocol/protocol-builder';
import { bearer, createPerson, tokenFor, type TestApp, patchCurrent } from '../support/test-app';

export const fixture = (name: string): Buffer => readFileSync(resolve(__dirname, 'fixtures', name));

export interface IntakeTrial {
  trialId: number;
  /** Test Garden (TG, 3 blocks) and Other Garden (OG, 3 blocks), each with 3 treatments. */
  siteId: number;
  otherSiteId: number;
  roundId: number;
  measures: { DT: number; CS: number; WR: number };
  plots: Record<string, number>;
  tokens: { investigator: string; collaborator: string; otherCollaborator: string; reviewer: string; nonMember: string };
  emails: { investigator: string; collaborator: string; reviewer: string };
  ids: { investigator: number; collaborator: number; reviewer: number };
}

/**
 * An active rcbd trial built through the API: treatments C, G, K; drain time (s, cut-off 600,
 * usual 5 to 600, possible 0 to 3600, 2 decimals), crumble score (1 to 5), water retained (mL, usual
 * 50 to 400, possible 0 to 1000); one round; two randomized sites; a collaborator for each site and a reviewer.
 */
export async function buildIntakeTrial(t: TestApp): Promise<IntakeTrial> {
  const investigator = await createPerson({ name: 'Intake investigator' });
  const token = await tokenFor(t, investigator);
  const auth = bearer(token);
  const trial = await expectStatus<{ id: number }>(
    t.http.post('/api/trials').set(auth).send({ code: uniqueCode('IN'), title: 'Intake trial', design: 'rcbd', seed: 'intake-seed', startDate: '2026-05-01' }),
    201,
  );
  const base = `/api/trials/${trial.id}`;
  for (const body of [{ code: 'C', name: 'Control', isControl: true }, { code: 'G', name: 'Gypsum' }, { code: 'K', name: 'Compost' }]) {
    await expectStatus(t.http.post(`${base}/treatments`).set(auth).send(body), 201);
  }
  const measureBodies = {
    DT: { code: 'DT', name: 'drain time', unit: 's', kind: 'time-with-cutoff', cutoff: 600, plausibleMin: 5, plausibleMax: 600, hardMin: 0, hardMax: 3600, decimals: 2, higherIsBetter: false },
    CS: { code: 'CS', name: 'crumble score', unit: 'score', kind: 'score', higherIsBetter: true, scaleMin: 1, scaleMax: 5, decimals: 0 },
    WR: { code: 'WR', name: 'water retained', unit: 'mL', kind: 'continuous', higherIsBetter: true, plausibleMin: 50, plausibleMax: 400, hardMin: 0, hardMax: 1000, decimals: 1 },
  };
  const measures = {} as IntakeTrial['measures'];
  for (const [code, body] of Object.entries(measureBodies)) {
    measures[code as keyof IntakeTrial['measures']] = (await expectStatus<{ id: number }>(t.http.post(`${base}/measures`).set(auth).send(body), 201)).id;
  }
  const round = await expectStatus<{ id: number }>(t.http.post(`${base}/rounds`).set(auth).send({ label: 'Day 0', dayOffset: 0, measureIds: Object.values(measures) }), 201);
  const siteIds: number[] = [];
  for (const [name, labelPrefix] of [['Test Garden', 'TG'], ['Other Garden', 'OG']]) {
    const site = await expectStatus<{ id: number }>(t.http.post(`${base}/sites`).set(auth).send({ name, shape: 'rectangle', lengthM: 1, widthM: 1, blocks: 3, labelPrefix }), 201);
    await expectStatus(t.http.post(`${base}/sites/${site.id}/randomize`).set(auth).send({}), 200);
    siteIds.push(site.id);
  }
  await expectStatus(patchCurrent(t, base, auth, { status: 'active' }), 200);
  const plotList = await expectStatus<Array<{ id: number; label: string }>>(t.http.get(`${base}/plots`).set(auth), 200);
  const collaborator = await createPerson({ name: 'Test Garden collaborator' });
  const otherCollaborator = await createPerson({ name: 'Other Garden collaborator' });
  const reviewer = await createPerson({ name: 'Intake reviewer' });
  await TrialMembership.create({ trialId: trial.id, userId: collaborator.id, role: 'collaborator', siteId: siteIds[0] });
  await TrialMembership.create({ trialId: trial.id, userId: otherCollaborator.id, role: 'collaborator', siteId: siteIds[1] });
  await TrialMembership.create({ trialId: trial.id, userId: reviewer.id, role: 'reviewer', siteId: null });
  return {
    trialId: trial.id,
    siteId: siteIds[0]!,
    otherSiteId: siteIds[1]!,
    roundId: round.id,
    measures,
    plots: Object.fromEntries(plotList.map((plot) => [plot.label, plot.id])),
    tokens: {
      investigator: token,
      collaborator: await tokenFor(t, collaborator),
      otherCollaborator: await tokenFor(t, otherCollaborator),
      reviewer: await tokenFor(t, reviewer),
      nonMember: await tokenFor(t, await createPerson({ name: 'Intake stranger' })),
    },
    emails: { investigator: investigator.email, collaborator: collaborator.email, reviewer: reviewer.email },
    ids: { investigator: investigator.id, collaborator: collaborator.id, reviewer: reviewer.id },
  };
}

export const intakePath = (built: IntakeTrial, siteId = built.siteId, query = '') =>
  `/api/trials/${built.trialId}/sites/${siteId}/rounds/${built.roundId}/intake${query}`;

/** Sends a file as multipart `file`, with optional form fields. */
export function upload(t: TestApp, token: string, path: string, bytes: Buffer, fileName = 'data.csv', fields: Record<string, string> = {}) {
  let request = t.http.post(path).set(bearer(token));
  for (const [name, value] of Object.entries(fields)) request = request.field(name, value);
  return request.attach('file', bytes, { filename: fileName, contentType: 'text/csv' });
}

/** Rows of the tables a write touches, for the trial: equal before and after a refused write. */
export async function rowCounts(sequelize: Sequelize, trialId: number) {
  const count = async (table: string) =>
    Number((await sequelize.query<{ n: number }>(`SELECT COUNT(*) AS n FROM ${table} WHERE trial_id = ?`, { replacements: [trialId], type: QueryTypes.SELECT }))[0]!.n);
  return {
    observations: await count('observations'),
    changes: await count('observation_changes'),
    uploads: await count('intake_uploads'),
    photos: await count('plot_photos'),
    activity: await count('activity_entries'),
  };
}

export interface StoredValue {
  plot: string;
  measure: string;
  valueText: string | null;
  valueDecimal: string | null;
  censored: number;
  missingReason: string | null;
  notes: string | null;
  version: number;
  source: string;
}

export async function storedValues(sequelize: Sequelize, trialId: number): Promise<StoredValue[]> {
  return sequelize.query<StoredValue>(
    `SELECT p.label AS plot, m.code AS measure, o.value_text AS valueText, CAST(o.value_decimal AS CHAR) AS valueDecimal, o.censored, o.missing_reason AS missingReason,
            o.notes, o.version, o.source
       FROM observations o JOIN plots p ON p.id = o.plot_id JOIN measures m ON m.id = o.measure_id
      WHERE o.trial_id = ? ORDER BY p.label, m.code`,
    { replacements: [trialId], type: QueryTypes.SELECT },
  );
}
