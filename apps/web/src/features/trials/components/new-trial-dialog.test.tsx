import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Route, Routes } from 'react-router-dom';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { TrialsList } from './trials-list';

const person = { id: 5, email: 'r@example.org', name: 'Rafe', isAdmin: false, isActive: true, createdAt: '2026-12-01T00:00:00.000Z' };

describe('New trial', () => {
  beforeEach(() => window.localStorage.setItem('friable.signedIn', '1'));
  afterEach(() => vi.unstubAllGlobals());

  it('creates a draft trial and opens its Protocol', async () => {
    const calls = mockApi({
      'GET /api/auth/me': { status: 200, body: person },
      'GET /api/trials': { status: 200, body: [] },
      'POST /api/trials': { status: 201, body: { id: 42, code: 'MULCH-27' } },
    });
    renderWithApp(
      <Routes>
        <Route path="/trials" element={<TrialsList />} />
        <Route path="/trials/:trialId/protocol" element={<p>Protocol of the new trial</p>} />
      </Routes>,
      { route: '/trials' },
    );
    await userEvent.click(await screen.findByRole('button', { name: 'New trial' }));
    const dialog = await screen.findByRole('dialog');
    await userEvent.type(within(dialog).getByLabelText('Code'), 'MULCH-27');
    await userEvent.type(within(dialog).getByLabelText('Title'), 'Straw and wood-chip mulch');
    await userEvent.selectOptions(within(dialog).getByLabelText('Design'), 'crd');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Create trial' }));
    expect(await screen.findByText('Protocol of the new trial')).toBeInTheDocument();
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ code: 'MULCH-27', title: 'Straw and wood-chip mulch', design: 'crd', question: null });
  });

  it('shows a taken code beside the Code field', async () => {
    mockApi({
      'GET /api/auth/me': { status: 200, body: person },
      'GET /api/trials': { status: 200, body: [] },
      'POST /api/trials': { status: 409, body: { statusCode: 409, error: 'Conflict', message: 'That code is already used by another trial.', errors: [{ field: 'code', message: 'code MULCH-27 is already taken' }] } },
    });
    renderWithApp(<TrialsList />, { route: '/trials' });
    await userEvent.click(await screen.findByRole('button', { name: 'New trial' }));
    const dialog = await screen.findByRole('dialog');
    await userEvent.type(within(dialog).getByLabelText('Code'), 'MULCH-27');
    await userEvent.type(within(dialog).getByLabelText('Title'), 'Mulch');
    await userEvent.click(within(dialog).getByRole('button', { name: 'Create trial' }));
    expect(await within(dialog).findByText('code MULCH-27 is already taken')).toBeInTheDocument();
    expect(within(dialog).getByText('That code is already used by another trial.')).toBeInTheDocument();
  });
});
