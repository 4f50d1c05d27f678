import type { Findings, TrialReport } from '@friable/contracts';
import { createOpenApiDocument } from '../../src/bootstrap';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Trial } from '../../src/trials/models/trial.model';
import { TrialMembership } from '../../src/trials/models/trial-membership.model';
import { buildIntakeTrial } from '../intake/intake-support';
import { bearer, createPerson, createTestApp, tokenFor, type TestApp } from '../support/test-app';

describe('Report: what the printable report page needs', () => {
  let t: TestApp;
  let base: string;
  let token: string;

  beforeAll(async () => {
    t = await createTestApp();
    const trial = await Trial.findOne({ where: { code: 'FW-CLAY-26' } });
    const collaborator = await createPerson({ name: 'Report reader' });
    await TrialMembership.create({ trialId: trial!.id, userId: collaborator.id, role: 'reviewer', siteId: null });
    token = await tokenFor(t, collaborator);
    base = `/api/trials/${trial!.id}`;
  });
  afterAll(() => t.close());

  it('gives, per measure, the Findings of the latest round with data at all sites combined, the cautions and the paragraph', async () => {
    const response = await t.http.get(`${base}/report`).set(bearer(token));
    expect(response.status).toBe(200);
    const report = response.body as TrialReport;
    expect(report.protocol.code).toBe('FW-CLAY-26');
    expect(report.protocol).not.toHaveProperty('myRoles');
    expect(report.sites).toHaveLength(3);
    expect(report.measures.map((m) => m.measure.code)).toEqual(['DRAIN', 'CRUMB', 'WATER', 'CRUST']);
    for (const entry of report.measures) {
      // The demo has Day 0 and Day 14 at every garden; Day 28 is still empty.
      expect(entry.round!.label).toBe('Day 14');
      const findings = (await t.http.get(`${base}/findings?analysis=anova&measureId=${entry.measure.id}&roundId=${entry.round!.id}`).set(bearer(token))).body as Findings;
      expect(entry.anova).toEqual(findings.anova);
      expect(entry.summary).toEqual(findings.summary);
      expect(entry.means.map((m) => [m.treatment, m.mean, m.se, m.letters, m.percentOfControl])).toEqual(
        findings.means.map((m) => [m.treatment, m.mean, m.se, findings.letters.tukey![m.treatment], findings.context.percentOfControl.find((p) => p.treatment === m.treatment)!.percent]),
      );
      expect(entry.rankTest).toEqual(findings.context.rankTest);
      for (const warning of [...findings.warnings, ...findings.context.notices]) expect(report.cautions).toContain(`${entry.measure.name}, Day 14: ${warning}`);
    }
    expect(report.cautions.some((c) => c.startsWith('drain time, Day 14: ') && c.includes('not drained by the cut-off'))).toBe(true);
    expect(report.explanation).toMatch(/do not prove/);
  });

  it('says plainly when a measure has no data yet, and answers non-members 404', async () => {
    const built = await buildIntakeTrial(t);
    const report = (await t.http.get(`/api/trials/${built.trialId}/report`).set(bearer(built.tokens.reviewer))).body as TrialReport;
    expect(report.measures.map((m) => [m.measure.code, m.round, m.anova, m.unavailable])).toEqual([
      ['DT', null, null, 'No values of drain time have been recorded yet.'],
      ['CS', null, null, 'No values of crumble score have been recorded yet.'],
      ['WR', null, null, 'No values of water retained have been recorded yet.'],
    ]);
    expect(report.cautions).toContain('drain time: No values of drain time have been recorded yet.');
    expect((await t.http.get(`${base}/report`).set(bearer(built.tokens.nonMember))).status).toBe(404);
  });

  it('documents the Findings, saved-analysis, export and report routes on the OpenAPI page', async () => {
    // The document /api/docs/openapi.json serves when API_DOCS_PUBLIC=true (closed by default).
    const paths = JSON.parse(JSON.stringify(createOpenApiDocument(t.app))).paths as Record<string, Record<string, unknown>>;
    const methods = (path: string) => Object.keys(paths[path] ?? {}).sort();
    expect(methods('/api/trials/{trialId}/findings')).toEqual(['get']);
    expect(methods('/api/trials/{trialId}/analyses')).toEqual(['get', 'post']);
    expect(methods('/api/trials/{trialId}/analyses/{analysisId}')).toEqual(['get']);
    expect(methods('/api/trials/{trialId}/analyses/{analysisId}/comments')).toEqual(['get', 'post']);
    expect(methods('/api/trials/{trialId}/analyses/{analysisId}/sign-offs')).toEqual(['post']);
    expect(methods('/api/trials/{trialId}/analyses/{analysisId}/review-requests')).toEqual(['post']);
    expect(methods('/api/trials/{trialId}/analyses/{analysisId}/comments/{commentId}')).toEqual(['delete', 'patch']);
    expect(methods('/api/trials/{trialId}/members/{userId}')).toEqual(['delete', 'patch']);
    for (const file of ['export.csv', 'export-dictionary.csv', 'export.xlsx', 'report']) expect(methods(`/api/trials/{trialId}/${file}`)).toEqual(['get']);
  });
});
