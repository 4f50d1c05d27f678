import { screen } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { TrialsList } from './trials-list';

const person = { id: 5, email: 'r@example.org', name: 'Rafe', isAdmin: false, isActive: true, createdAt: '2026-12-01T00:00:00.000Z' };

describe('TrialsList', () => {
  beforeEach(() => window.localStorage.setItem('friable.signedIn', '1'));
  afterEach(() => vi.unstubAllGlobals());

  it('lists each trial with its code, status, design and the person’s roles', async () => {
    mockApi({
      'GET /api/auth/me': { status: 200, body: person },
      'GET /api/trials': {
        status: 200,
        body: [
          { id: 1, code: 'FW-CLAY-26', title: 'Clay amendments', design: 'rcbd', status: 'active', myRoles: ['reviewer'], updatedAt: '2026-11-30T10:00:00.000Z' },
          { id: 2, code: 'FW-MULCH', title: 'Mulch depths', design: 'crd', status: 'draft', myRoles: ['investigator', 'collaborator'], updatedAt: '2026-11-02T10:00:00.000Z' },
        ],
      },
    });
    renderWithApp(<TrialsList />);
    expect(await screen.findByRole('link', { name: 'Clay amendments' })).toHaveAttribute('href', '/trials/1');
    expect(screen.getByText('FW-CLAY-26')).toBeInTheDocument();
    expect(screen.getByText('Active')).toBeInTheDocument();
    expect(screen.getByText('Randomized complete block')).toBeInTheDocument();
    expect(screen.getByText('Completely randomized')).toBeInTheDocument();
    expect(screen.getByText('updated 30 Nov 2026')).toBeInTheDocument();
    expect(screen.getByText('Reviewer')).toBeInTheDocument();
    expect(screen.getByText('Investigator')).toBeInTheDocument();
    expect(screen.getByText('Collaborator')).toBeInTheDocument();
  });

  it('explains an empty list in words', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: person }, 'GET /api/trials': { status: 200, body: [] } });
    renderWithApp(<TrialsList />);
    expect(await screen.findByText('No trials yet')).toBeInTheDocument();
    expect(screen.getByText(/When an investigator adds you to a trial/)).toBeInTheDocument();
  });

  it('shows a failure in words with a way to try again', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: person }, 'GET /api/trials': { status: 500, body: { statusCode: 500, message: 'Something went wrong on the server.' } } });
    renderWithApp(<TrialsList />);
    expect(await screen.findByText('Your trials could not be loaded')).toBeInTheDocument();
    expect(screen.getByText('Something went wrong on the server.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Try again' })).toBeInTheDocument();
  });
});
