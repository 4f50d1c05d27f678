import type { AnovaAnswer } from '@friable/contracts';
import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import { renderWithApp } from '../../../test/render';
import { DesignAnalysisPanel } from './design-analysis-panel';

// Invented numbers: these tests check what the panel shows of a split-plot answer, not the arithmetic.
const splitPlot: Pick<AnovaAnswer, 'anova' | 'model' | 'strata' | 'differences' | 'slices'> = {
  anova: [
    { term: 'block', df: 3, ss: 9, ms: 3, f: 3, p: 0.1, errorTerm: 'block:Amendment' },
    { term: 'Amendment', df: 2, ss: 20, ms: 10, f: 10, p: 0.012, errorTerm: 'block:Amendment' },
    { term: 'block:Amendment', df: 6, ss: 6, ms: 1, f: null, p: null, errorTerm: null },
    { term: 'Mulch', df: 1, ss: 4, ms: 4, f: 8, p: 0.011, errorTerm: 'error' },
    { term: 'Amendment:Mulch', df: 2, ss: 6, ms: 3, f: 6, p: 0.02, errorTerm: 'error' },
    { term: 'error', df: 9, ss: 4.5, ms: 0.5, f: null, p: null, errorTerm: null },
  ],
  model: { kind: 'anova', reason: 'Every plot is present, so the classical ANOVA is exact.' },
  strata: [
    { stratum: 'whole plot', errorTerm: 'block:Amendment', ms: 1, df: 6, terms: ['block', 'Amendment'] },
    { stratum: 'sub plot', errorTerm: 'error', ms: 0.5, df: 9, terms: ['Mulch', 'Amendment:Mulch'] },
  ],
  differences: [
    { kind: 'Amendment', description: 'Two Amendment (whole-plot) means', se: 0.5, df: 6, critical: 2.45, lsd: 1.22, errorTerm: 'block:Amendment' },
    { kind: 'Amendment within Mulch', description: 'Two Amendment (whole-plot) means at the same or different levels of Mulch', se: 0.6, df: 11.2, critical: 2.3, lsd: 1.38, errorTerm: 'block:Amendment and error (Satterthwaite)' },
  ],
  slices: [
    {
      factor: 'Mulch',
      within: 'Amendment',
      level: 'compost',
      numDf: 1,
      denDf: 9,
      f: 12,
      p: 0.007,
      errorTerm: 'error',
      df: 9,
      comparisons: {},
      letters: { tukey: { straw: 'a', bare: 'b' } },
      means: [
        { levels: { Amendment: 'compost', Mulch: 'straw' }, treatment: 'straw', n: 4, mean: 12.25, se: 0.35 },
        { levels: { Amendment: 'compost', Mulch: 'bare' }, treatment: 'bare', n: 4, mean: 10.5, se: 0.35 },
      ],
    },
  ],
};

describe('DesignAnalysisPanel', () => {
  it('shows the model, each term’s error stratum, the strata, the standard errors of a difference and the slices with their groups', () => {
    renderWithApp(<DesignAnalysisPanel answer={splitPlot} method="tukey" decimals={1} />);
    expect(screen.getByText(/Classical analysis of variance\./)).toBeInTheDocument();
    const tested = screen.getByRole('table', { name: 'Each term and the error it is tested against' });
    expect(within(tested).getByRole('row', { name: /^Amendment Whole-plot error/ })).toBeInTheDocument();
    expect(within(tested).getByRole('row', { name: /^Mulch Sub-plot error/ })).toBeInTheDocument();
    expect(within(tested).getByRole('row', { name: /^Amendment × Mulch Sub-plot error/ })).toBeInTheDocument();
    const strata = screen.getByRole('table', { name: 'Error strata' });
    expect(within(strata).getByRole('row', { name: /whole plot/ })).toHaveTextContent('Blocks, Amendment');
    const differences = screen.getByRole('table', { name: 'Standard errors of a difference' });
    expect(within(differences).getByRole('row', { name: /same or different levels of Mulch/ })).toHaveTextContent('mixed strata: weighted t, Satterthwaite df');
    const slice = screen.getByRole('table', { name: 'Mulch within Amendment compost' });
    expect(within(within(slice).getByRole('row', { name: /^straw/ })).getByText('a')).toBeInTheDocument();
    expect(within(within(slice).getByRole('row', { name: /^bare/ })).getByText('b')).toBeInTheDocument();
  });

  it('shows the LSD column of the standard errors of a difference only when the LSD is the chosen method', () => {
    const { unmount } = renderWithApp(<DesignAnalysisPanel answer={splitPlot} method="tukey" decimals={1} />);
    const withTukey = screen.getByRole('table', { name: 'Standard errors of a difference' });
    expect(within(withTukey).queryByRole('columnheader', { name: 'LSD' })).toBeNull();
    expect(within(withTukey).queryByText('1.22')).toBeNull();
    unmount();
    renderWithApp(<DesignAnalysisPanel answer={splitPlot} method="lsd" decimals={1} />);
    const withLsd = screen.getByRole('table', { name: 'Standard errors of a difference' });
    expect(within(withLsd).getByRole('columnheader', { name: 'LSD' })).toBeInTheDocument();
    // The fixture's LSD of two Amendment means, 1.22 (means are shown with one decimal more than the readings).
    expect(within(within(withLsd).getAllByRole('row', { name: /^Two Amendment \(whole-plot\) means / })[0]!).getByText('1.22')).toBeInTheDocument();
  });

  it('shows nothing for a one-factor answer', () => {
    const { container } = renderWithApp(<DesignAnalysisPanel answer={{ anova: [] }} method="tukey" decimals={1} />);
    expect(container.querySelector('section')).toBeNull();
  });
});
