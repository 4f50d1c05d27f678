import type { AnalysisSnapshot, Findings, TrialDetail } from '@friable/contracts';
import { fireEvent, screen, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { SnapshotView } from './snapshot-view';

vi.mock('./findings-plots', () => ({ FindingsPlots: () => <p>plots</p> }));

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
const review = { expectedRole: 'reviewer', expected: 2, signed: 1, label: 'Signed by 1 of 2 reviewers', awaiting: ['Rafe'], lastRequestedAt: null };
const signOff = {
  id: 1,
  analysisId: 9,
  userId: 11,
  name: 'Vera',
  role: 'reviewer',
  statement: 'Checked the layout and the model.',
  signedAt: '2026-12-01T12:00:00.000Z',
  dataHash: 'a'.repeat(64),
  engineVersion: '0.1.0',
  state: 'data-changed',
};
const snapshot = (extra: Partial<AnalysisSnapshot>) =>
  ({ id: 9, trialId: 3, title: 'Week 4 yield', result, dataChanged: false, createdBy: 'Ines', createdAt: '2026-12-01T10:00:00.000Z', signedOffAt: null, signedOffBy: null, signOffs: [], review, ...extra }) as AnalysisSnapshot;
const comment = (extra: object) => ({
  id: 1,
  analysisId: 9,
  parentId: null,
  body: 'Looks sound.',
  authorId: 8,
  authorName: 'Rafe',
  createdAt: '2026-12-01T11:00:00.000Z',
  editedAt: null,
  deletedAt: null,
  resolvedAt: null,
  resolvedByName: null,
  revisions: [],
  ...extra,
});
const reviewerOnLockedTrial = { ...trial, status: 'locked', myRoles: ['reviewer'] } as TrialDetail;

describe('SnapshotView', () => {
  beforeEach(() => window.localStorage.setItem('friable.signedIn', '1'));
  afterEach(() => vi.unstubAllGlobals());

  it('shows the stored numbers, the review status, each sign-off with its state, and the comment threads', async () => {
    mockApi({
      'GET /api/auth/me': { status: 200, body: person },
      'GET /api/trials/3/analyses/9': { status: 200, body: snapshot({ dataChanged: true, signOffs: [signOff] } as never) },
      'GET /api/trials/3/analyses/9/comments': {
        status: 200,
        body: [
          comment({ editedAt: '2026-12-01T11:30:00.000Z', revisions: [{ kind: 'edited', body: 'Looks fine.', at: '2026-12-01T11:30:00.000Z', byName: 'Rafe' }] }),
          comment({ id: 2, parentId: 1, body: 'Agreed.', authorId: 7, authorName: 'Ines' }),
          comment({ id: 3, body: '', deletedAt: '2026-12-01T12:00:00.000Z', authorId: 7, authorName: 'Ines' }),
        ],
      },
    });
    renderWithApp(<SnapshotView trial={trial} analysisId={9} meId={7} onClose={() => {}} />);
    expect(await screen.findByText('The data have changed since this analysis was saved')).toBeInTheDocument();
    expect(screen.getByRole('table', { name: 'Treatment means' })).toHaveTextContent('111 %');
    expect(screen.getAllByText('Signed by 1 of 2 reviewers').length).toBeGreaterThan(0);
    expect(screen.getByRole('list', { name: 'Sign-offs' })).toHaveTextContent('Vera (Reviewer)');
    expect(screen.getByRole('list', { name: 'Sign-offs' })).toHaveTextContent('Data changed after sign-off');
    expect(await screen.findByText('Looks sound.')).toBeInTheDocument();
    expect(screen.getByText('edited')).toBeInTheDocument();
    expect(within(screen.getByRole('list', { name: 'Replies' })).getByText('Agreed.')).toBeInTheDocument();
    expect(screen.getByText(/This comment was deleted on/)).toBeInTheDocument();
    // Only one's own live comment can be edited: Ines's reply, not Rafe's comment nor the deleted one.
    expect(screen.getAllByRole('button', { name: 'Edit' })).toHaveLength(1);
    fireEvent.click(screen.getAllByRole('button', { name: 'History' })[0]);
    expect(screen.getByRole('list', { name: 'Earlier versions' })).toHaveTextContent('Looks fine.');
    // The investigator of a trial with reviewers asks for review rather than signing.
    expect(screen.getByRole('button', { name: 'Ask the reviewers to review' })).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Sign off with this statement' })).toBeNull();
  });

  it('lets a reviewer of a locked trial sign off with a statement, and keeps the server’s sentence when refused', async () => {
    const calls = mockApi({
      'GET /api/auth/me': { status: 200, body: person },
      'GET /api/trials/3/analyses/9': { status: 200, body: snapshot({}) },
      'GET /api/trials/3/analyses/9/comments': { status: 200, body: [] },
      'POST /api/trials/3/analyses/9/sign-offs': {
        status: 409,
        body: { statusCode: 409, error: 'Conflict', message: 'This analysis was already signed off by you on 2026-12-01.' },
      },
    });
    renderWithApp(<SnapshotView trial={reviewerOnLockedTrial} analysisId={9} meId={7} onClose={() => {}} />);
    const button = await screen.findByRole('button', { name: 'Sign off with this statement' });
    expect(button).toBeDisabled();
    fireEvent.change(screen.getByLabelText(/Your statement/), { target: { value: 'I checked the model.' } });
    expect(button).toBeEnabled();
    fireEvent.click(button);
    expect(await screen.findByRole('alert')).toHaveTextContent('This analysis was already signed off by you');
    const sent = calls.find((c) => c.method === 'POST' && c.path === '/api/trials/3/analyses/9/sign-offs');
    expect(sent?.body).toEqual({ statement: 'I checked the model.' });
  });

  it('tells a reviewer that sign-off waits for the lock', async () => {
    mockApi({
      'GET /api/auth/me': { status: 200, body: person },
      'GET /api/trials/3/analyses/9': { status: 200, body: snapshot({}) },
      'GET /api/trials/3/analyses/9/comments': { status: 200, body: [] },
    });
    renderWithApp(<SnapshotView trial={{ ...reviewerOnLockedTrial, status: 'active' }} analysisId={9} meId={7} onClose={() => {}} />);
    expect(await screen.findByText(/Sign-off opens once the investigator locks the trial/)).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Sign off with this statement' })).toBeNull();
  });
});
