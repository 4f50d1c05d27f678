import type { AnalysisSnapshot } from '@friable/contracts';
import { expect } from 'vitest';
import { TrialMembership } from '../../src/trials/models/trial-membership.model';
import { buildIntakeTrial, intakePath, upload, type IntakeTrial } from '../intake/intake-support';
import { bearer, createPerson, tokenFor, type TestApp } from '../support/test-app';

export interface ReviewTrial {
  built: IntakeTrial;
  base: string;
  saved: AnalysisSnapshot;
  /** A second reviewer beside the intake trial's own. */
  second: { token: string; email: string; id: number };
}

/**
 * An intake trial with water-retained values for its nine Test Garden plots (invented test data), a second
 * reviewer, and one saved analysis of them under `title`, ready for review.
 */
export async function buildReviewTrial(t: TestApp, options: { values: string[]; title: string; secondReviewerName: string }): Promise<ReviewTrial> {
  const built = await buildIntakeTrial(t);
  const base = `/api/trials/${built.trialId}`;
  const labels = Object.keys(built.plots).filter((label) => label.startsWith('TG-')).sort();
  const csv = `plot label,water retained (mL)\n${labels.map((label, i) => `${label},${options.values[i]}`).join('\n')}\n`;
  const loaded = await upload(t, built.tokens.collaborator, intakePath(built), Buffer.from(csv), 'day0.csv');
  if (loaded.status !== 200) throw new Error(JSON.stringify(loaded.body));
  const person = await createPerson({ name: options.secondReviewerName });
  await TrialMembership.create({ trialId: built.trialId, userId: person.id, role: 'reviewer', siteId: null });
  const second = { token: await tokenFor(t, person), email: person.email, id: person.id };
  const response = await t.http
    .post(`${base}/analyses`)
    .set(bearer(built.tokens.investigator))
    .send({ measureId: built.measures.WR, roundId: built.roundId, siteId: built.siteId, title: options.title });
  expect(response.status).toBe(201);
  return { built, base, saved: response.body as AnalysisSnapshot, second };
}
