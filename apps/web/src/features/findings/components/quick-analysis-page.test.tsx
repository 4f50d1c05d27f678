import { fireEvent, screen, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { QuickAnalysisPage } from './quick-analysis-page';

vi.mock('./findings-plots', () => ({ FindingsPlots: () => <p>plots</p> }));

const person = { id: 1, email: 'rafe@example.org', name: 'Rafe', isAdmin: false, isActive: true, createdAt: '2026-12-01T00:00:00.000Z' };
// The answer shape of POST /api/stats/anova; the numbers are Montgomery's hardness tips (STATISTICS.md B.1, R 4.2.2).
const answer = {
  anova: [
    { term: 'block', df: 3, ss: 0.825, ms: 0.275, f: 30.9375, p: 0.0000452 },
    { term: 'treatment', df: 3, ss: 0.385, ms: 0.128333, f: 14.4375, p: 0.0008713 },
    { term: 'error', df: 9, ss: 0.08, ms: 0.0088889, f: null, p: null },
    { term: 'total', df: 15, ss: 1.29, ms: null, f: null, p: null },
  ],
  summary: { n: 16, grandMean: 9.625, cv: 0.979542, rootMse: 0.0942809, errorDf: 9 },
  means: [
    { treatment: '1', n: 4, mean: 9.575, se: 0.0471405 },
    { treatment: '2', n: 4, mean: 9.6, se: 0.0471405 },
    { treatment: '3', n: 4, mean: 9.45, se: 0.0471405 },
    { treatment: '4', n: 4, mean: 9.875, se: 0.0471405 },
  ],
  comparisons: { tukey: { critical: 3.12, leastSignificantDifference: 0.20812, pairs: [{ a: '4', b: '3', diff: 0.425, se: 0.0666667, lower: 0.217, upper: 0.633, p: 0.000606, significant: true }] } },
  letters: { tukey: { '1': 'b', '2': 'b', '3': 'b', '4': 'a' } },
  diagnostics: { shapiroWilk: { w: 0.94, p: 0.34 }, brownForsythe: { f: 0.22, p: 0.88 }, residuals: [] },
  warnings: ['The error has only 9 degrees of freedom (fewer than 12), so the tests have little power; more blocks would help.'],
};

describe('QuickAnalysisPage', () => {
  beforeEach(() => window.localStorage.setItem('friable.signedIn', '1'));
  afterEach(() => vi.unstubAllGlobals());

  it('guesses the columns and design of pasted data and shows the ANOVA, letters and warnings', async () => {
    const calls = mockApi({
      'GET /api/auth/me': { status: 200, body: person },
      'POST /api/stats/anova': { status: 200, body: answer },
      'POST /api/stats/friedman': { status: 200, body: { statistic: 8.846, df: 3, p: 0.0314, blocksUsed: 4, droppedBlocks: [] } },
    });
    renderWithApp(<QuickAnalysisPage />);
    fireEvent.change(screen.getByLabelText('Data to analyse'), { target: { value: 'tip,coupon,hardness\n1,1,9.3\n1,2,9.4\n2,1,9.4\n2,2,9.3' } });
    expect(screen.getByLabelText('Role of column coupon')).toHaveValue('block');
    expect(screen.getByLabelText('Design')).toHaveValue('rcbd');
    fireEvent.click(screen.getByRole('button', { name: 'Analyse' }));
    const anova = await screen.findByRole('table', { name: 'Analysis of variance' });
    expect(within(anova).getByRole('row', { name: /Treatments/ })).toHaveTextContent('14.44');
    expect(within(screen.getByRole('table', { name: 'Treatment means' })).getByRole('row', { name: /^4/ })).toHaveTextContent('a');
    expect(screen.getByText(/only 9 degrees of freedom/)).toBeInTheDocument();
    expect(await screen.findByText(/Friedman test/)).toHaveTextContent('χ² = 8.846 on 3 df');
    const sent = calls.find((c) => c.path === '/api/stats/anova')!.body as { design: string; observations: unknown[] };
    expect(sent.design).toBe('rcbd');
    expect(sent.observations[0]).toEqual({ treatment: '1', block: '1', value: '9.3' });
  });

  it("shows the server's refusal in words", async () => {
    mockApi({
      'GET /api/auth/me': { status: 200, body: person },
      'POST /api/stats/anova': { status: 422, body: { statusCode: 422, error: 'Unprocessable Entity', message: 'the crd model uses all 2 observations, leaving none to estimate error' } },
      'POST /api/stats/kruskal': { status: 422, body: { statusCode: 422, error: 'Unprocessable Entity', message: 'too few' } },
    });
    renderWithApp(<QuickAnalysisPage />);
    fireEvent.change(screen.getByLabelText('Data to analyse'), { target: { value: 'tip,hardness\n1,9.3\n2,9.4' } });
    fireEvent.click(screen.getByRole('button', { name: 'Analyse' }));
    expect(await screen.findByText('the crd model uses all 2 observations, leaving none to estimate error')).toBeInTheDocument();
  });
});
