import type { Observation, TrialDetail } from '@friable/contracts';
import { Trial } from '../../src/trials/models/trial.model';
import { TrialMembership } from '../../src/trials/models/trial-membership.model';
import { bearer, createPerson, createTestApp, tokenFor, type TestApp } from '../support/test-app';

/** The demo trial FW-CLAY-26 (rcbd at three gardens, five treatments, control CTL) opened by a reviewer of its own. */
export interface DemoTrial {
  t: TestApp;
  /** `/api/trials/<id>` */
  base: string;
  token: string;
  protocol: TrialDetail;
  measure(code: string): TrialDetail['measures'][number];
  round(label: string): TrialDetail['rounds'][number];
  /** GET as the reviewer. */
  get(path: string): ReturnType<TestApp['http']['get']>;
  /** POST as the reviewer. */
  post(path: string, body: object): ReturnType<TestApp['http']['post']>;
  /** The observations holding a value, from GET /observations?<query>. */
  stored(query: string): Promise<Observation[]>;
}

/**
 * Opens the seeded demo trial through the whole API: a new person (named `reviewerName`) becomes its reviewer, and the
 * protocol is read as they see it. Close with `demo.t.close()`.
 */
export async function openDemoTrial(reviewerName: string): Promise<DemoTrial> {
  const t = await createTestApp();
  const trial = await Trial.findOne({ where: { code: 'FW-CLAY-26' } });
  if (!trial) throw new Error('The demo trial FW-CLAY-26 is not in the test database.');
  const reviewer = await createPerson({ name: reviewerName });
  await TrialMembership.create({ trialId: trial.id, userId: reviewer.id, role: 'reviewer', siteId: null });
  const token = await tokenFor(t, reviewer);
  const base = `/api/trials/${trial.id}`;
  const get = (path: string) => t.http.get(path).set(bearer(token));
  const protocol = (await get(base)).body as TrialDetail;
  return {
    t,
    base,
    token,
    protocol,
    measure: (code) => protocol.measures.find((m) => m.code === code) ?? (() => { throw new Error(`no measure ${code} in the demo`); })(),
    round: (label) => protocol.rounds.find((r) => r.label === label) ?? (() => { throw new Error(`no round ${label} in the demo`); })(),
    get,
    post: (path, body) => t.http.post(path).set(bearer(token)).send(body),
    stored: async (query) => ((await get(`${base}/observations?${query}`)).body as Observation[]).filter((o) => o.valueText !== null),
  };
}
