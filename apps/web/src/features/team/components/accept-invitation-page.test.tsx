import { fireEvent, screen } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { AcceptInvitationPage } from './accept-invitation-page';

const preview = {
  trialCode: 'CLAY',
  trialTitle: 'Clay trial',
  role: 'collaborator',
  siteName: 'Millbrook',
  email: 'robin@example.org',
  invitedByName: 'Ines',
  accountExists: false,
  expiresAt: '2026-12-08T10:00:00.000Z',
};
const user = { id: 9, email: 'robin@example.org', name: 'Robin', isAdmin: false, isActive: true, createdAt: '2026-12-01T00:00:00.000Z' };

describe('AcceptInvitationPage', () => {
  beforeEach(() => window.localStorage.clear());
  afterEach(() => vi.unstubAllGlobals());

  it('says what the invitation is for, creates the account and opens the trial signed in', async () => {
    const calls = mockApi({
      'GET /api/invitations/tok123': { status: 200, body: preview },
      'POST /api/invitations/tok123/accept': { status: 201, body: { accessToken: 'new-token', tokenType: 'Bearer', expiresIn: 3600, user, trialId: 7 } },
    });
    const joined = vi.fn();
    renderWithApp(<AcceptInvitationPage token="tok123" onJoined={joined} />);
    expect(await screen.findByRole('heading', { name: 'Join Clay trial' })).toBeInTheDocument();
    expect(screen.getByText('Millbrook')).toBeInTheDocument();
    fireEvent.change(screen.getByLabelText('Your name'), { target: { value: ' Robin ' } });
    fireEvent.change(screen.getByLabelText('Choose a password'), { target: { value: 'a long passphrase' } });
    fireEvent.click(screen.getByRole('button', { name: 'Join the trial' }));
    await vi.waitFor(() => expect(joined).toHaveBeenCalledWith('/trials/7'));
    expect(window.localStorage.getItem('friable.signedIn')).toBe('1');
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ name: 'Robin', password: 'a long passphrase' });
  });

  it('asks only for the password when the account exists', async () => {
    mockApi({ 'GET /api/invitations/tok123': { status: 200, body: { ...preview, accountExists: true } } });
    renderWithApp(<AcceptInvitationPage token="tok123" onJoined={vi.fn()} />);
    expect(await screen.findByLabelText('Your Friable password')).toBeInTheDocument();
    expect(screen.queryByLabelText('Your name')).not.toBeInTheDocument();
  });

  it('explains a used link in the server’s words', async () => {
    mockApi({
      'GET /api/invitations/used': { status: 410, body: { statusCode: 410, message: 'This invitation has already been used. Sign in to open the trial.' } },
    });
    renderWithApp(<AcceptInvitationPage token="used" onJoined={vi.fn()} />);
    expect(await screen.findByText('This invitation cannot be used')).toBeInTheDocument();
    expect(screen.getByText('This invitation has already been used. Sign in to open the trial.')).toBeInTheDocument();
  });
});
