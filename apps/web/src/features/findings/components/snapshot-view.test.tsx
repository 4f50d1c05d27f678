import type { AnalysisSnapshot, Findings, TrialDetail } from '@friable/contracts';
import { fireEvent, screen } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { SnapshotView } from './snapshot-view';

vi.mock('./lazy-findings-plots', () => ({ LazyFindingsPlots: () => <p>plots</p> }));

// Invented numbers: these tests check what the page shows of a stored answer, not the arithmetic.
const person = { id: 7, email: 'ines@example.org', name: 'Ines', isAdmin: false, isActive: true, createdAt: '2026-11-01T00:00:00.000Z' };
const trial = { id: 3, code: 'T-1', title: 'Test trial', design: 'rcbd', status: 'active', myRoles: ['investigator'], mySiteIds: [], treatments: [], measures: [], rounds: [], sites: [] } as unknown as TrialDetail;
const result = {
  anova: [
    { term: 'treatment', df: 1, ss: 2, ms: 2, f: 8, p: 0.03 },
    { term: 'error', df: 6, ss: 1.5, ms: 0.25, f: null, p: null },
  ],
  summary: { n: 8, grandMean: 10, cv: 5, rootMse: 0.5, errorDf: 6 },
  means: [
    { treatment: 'CTL', n: 4, mean: 9.5, se: 0.25 },
    { treatment: 'GYP', n: 4, mean: 10.5, se: 0.25 },
  ],
  comparisons: { tukey: { critical: 2.4, leastSignificantDifference: 0.86, pairs: [{ a: 'GYP', b: 'CTL', diff: 1, se: 0.35, lower: 0.14, upper: 1.86, p: 0.03, significant: true }] } },
  letters: { tukey: { CTL: 'b', GYP: 'a' } },
  diagnostics: { shapiroWilk: null, brownForsythe: null, residuals: [] },
  warnings: [],
  context: {
    choices: { measureId: 1, roundId: 2, siteId: 4, sitesAre: 'random', transform: 'none', method: 'tukey', alpha: 0.05, forceLsd: false },
    measure: { id: 1, code: 'Y', name: 'Yield', unit: 'g', kind: 'continuous', higherIsBetter: true, cutoff: null, decimals: 1 },
    round: { id: 2, label: 'Week 4', dayOffset: 28 },
    scope: { siteId: 4, siteName: 'North', label: 'North', siteNames: ['North'] },
    observations: [],
    controlCode: 'CTL',
    percentOfControl: [
      { treatment: 'CTL', percent: 100 },
      { treatment: 'GYP', percent: 110.5 },
    ],
    rankTest: { test: 'friedman', statistic: 4, df: 1, p: 0.0455 },
    meansOverTime: [],
    notices: [],
    missing: { count: 0, reasons: [] },
  },
} as unknown as Findings;
const snapshot = (extra: Partial<AnalysisSnapshot>) =>
  ({ id: 9, trialId: 3, title: 'Week 4 yield', result, dataChanged: false, createdBy: 'Ines', createdAt: '2026-12-01T10:00:00.000Z', signedOffAt: null, signedOffBy: null, ...extra }) as AnalysisSnapshot;

describe('SnapshotView', () => {
  beforeEach(() => window.localStorage.setItem('friable.accessToken', 'token'));
  afterEach(() => vi.unstubAllGlobals());

  it('shows the stored numbers with a notice that the data changed, and the comments', async () => {
    mockApi({
      'GET /api/auth/me': { status: 200, body: person },
      'GET /api/trials/3/analyses/9': { status: 200, body: snapshot({ dataChanged: true }) },
      'GET /api/trials/3/analyses/9/comments': { status: 200, body: [{ id: 1, analysisId: 9, body: 'Looks sound.', authorId: 8, authorName: 'Rafe', createdAt: '2026-12-01T11:00:00.000Z' }] },
    });
    renderWithApp(<SnapshotView trial={trial} analysisId={9} onClose={() => {}} />);
    expect(await screen.findByText('The data have changed since this analysis was saved')).toBeInTheDocument();
    expect(screen.getByRole('table', { name: 'Treatment means' })).toHaveTextContent('111 %');
    expect(await screen.findByText('Looks sound.')).toBeInTheDocument();
  });

  it("keeps the server's sentence when the sign-off is refused", async () => {
    const calls = mockApi({
      'GET /api/auth/me': { status: 200, body: person },
      'GET /api/trials/3/analyses/9': { status: 200, body: snapshot({}) },
      'GET /api/trials/3/analyses/9/comments': { status: 200, body: [] },
      'POST /api/trials/3/analyses/9/sign-off': {
        status: 409,
        body: { statusCode: 409, error: 'Conflict', message: 'Lock the trial before signing off an analysis, so its data cannot change after the sign-off.' },
      },
    });
    renderWithApp(<SnapshotView trial={trial} analysisId={9} onClose={() => {}} />);
    fireEvent.click(await screen.findByRole('button', { name: 'Sign off this analysis' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('Lock the trial before signing off an analysis');
    expect(calls.some((c) => c.method === 'POST' && c.path === '/api/trials/3/analyses/9/sign-off')).toBe(true);
  });
});
