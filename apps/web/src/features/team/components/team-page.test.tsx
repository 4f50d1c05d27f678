import type { TrialDetail } from '@friable/contracts';
import { fireEvent, screen, within } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { TeamPage } from './team-page';

const person = { id: 1, email: 'ines@example.org', name: 'Ines', isAdmin: false, isActive: true, createdAt: '2026-12-01T00:00:00.000Z' };
const site = (id: number, name: string) => ({ id, name }) as TrialDetail['sites'][number];
const trial = (roles: TrialDetail['myRoles']) =>
  ({ id: 7, code: 'CLAY', title: 'Clay trial', myRoles: roles, mySiteIds: [], sites: [site(11, 'Millbrook'), site(12, 'Hollow Lane')] }) as unknown as TrialDetail;
const members = [
  { membershipId: 1, userId: 1, name: 'Ines', email: 'ines@example.org', role: 'investigator', siteId: null, siteName: null, since: '2026-11-02T10:00:00.000Z' },
  { membershipId: 2, userId: 2, name: 'Cal', email: 'cal@example.org', role: 'collaborator', siteId: 12, siteName: 'Hollow Lane', since: '2026-11-20T10:00:00.000Z' },
];
const pending = {
  id: 40,
  email: 'new@example.org',
  role: 'collaborator',
  siteId: 11,
  siteName: 'Millbrook',
  invitedByName: 'Ines',
  sentAt: '2026-12-01T10:00:00.000Z',
  expiresAt: '2026-12-08T10:00:00.000Z',
  status: 'pending',
};

describe('TeamPage', () => {
  beforeEach(() => window.localStorage.setItem('friable.signedIn', '1'));
  afterEach(() => vi.unstubAllGlobals());

  it('shows members with role and site, and the investigator’s pending invitations', async () => {
    mockApi({
      'GET /api/auth/me': { status: 200, body: person },
      'GET /api/trials/7/members': { status: 200, body: members },
      'GET /api/trials/7/invitations': { status: 200, body: [pending, { ...pending, id: 41, email: 'old@example.org', status: 'accepted' }] },
    });
    renderWithApp(<TeamPage trial={trial(['investigator'])} />);
    const table = await screen.findByRole('table', { name: 'Members' });
    expect(within(table).getByText('Cal')).toBeInTheDocument();
    expect(within(table).getByText('Hollow Lane')).toBeInTheDocument();
    expect(within(table).getByText('Investigator')).toBeInTheDocument();
    const invitations = await screen.findByRole('region', { name: 'Pending invitations' });
    expect(within(invitations).getByText('new@example.org')).toBeInTheDocument();
    expect(within(invitations).queryByText('old@example.org')).not.toBeInTheDocument();
    expect(within(invitations).getByText('Waiting, until 8 Dec 2026')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Resend the invitation to new@example.org' })).toBeInTheDocument();
  });

  it('sends an invitation with the chosen site and shows the server’s field message', async () => {
    const calls = mockApi({
      'GET /api/auth/me': { status: 200, body: person },
      'GET /api/trials/7/members': { status: 200, body: members },
      'GET /api/trials/7/invitations': { status: 200, body: [] },
      'POST /api/trials/7/invitations': {
        status: 422,
        body: { statusCode: 422, message: 'Please correct: site must be one of this trial’s sites.', errors: [{ field: 'siteId', message: 'site must be one of this trial’s sites' }] },
      },
    });
    renderWithApp(<TeamPage trial={trial(['investigator'])} />);
    fireEvent.change(await screen.findByLabelText('E-mail'), { target: { value: 'robin@example.org' } });
    fireEvent.change(screen.getByLabelText('Site'), { target: { value: '11' } });
    fireEvent.click(screen.getByRole('button', { name: 'Send invitation' }));
    expect(await screen.findByText('site must be one of this trial’s sites')).toBeInTheDocument();
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ email: 'robin@example.org', role: 'collaborator', siteId: 11, message: null });
  });

  it('shows a collaborator the members only, with no invitation tools', async () => {
    const calls = mockApi({ 'GET /api/auth/me': { status: 200, body: person }, 'GET /api/trials/7/members': { status: 200, body: members } });
    renderWithApp(<TeamPage trial={trial(['collaborator'])} />);
    expect(await screen.findByRole('table', { name: 'Members' })).toBeInTheDocument();
    expect(screen.getByText('The investigator manages the team. You can see who takes part and where.')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Send invitation' })).not.toBeInTheDocument();
    expect(calls.some((c) => c.path.includes('invitations'))).toBe(false);
  });

  it('lets the investigator change a collaborator’s sites and remove them after a clear question', async () => {
    const calls = mockApi({
      'GET /api/auth/me': { status: 200, body: person },
      'GET /api/trials/7/members': { status: 200, body: members },
      'GET /api/trials/7/invitations': { status: 200, body: [] },
      'PATCH /api/trials/7/members/2': {
        status: 200,
        body: [members[0], { ...members[1], siteId: 11, siteName: 'Millbrook', membershipId: 3 }, { ...members[1], membershipId: 4 }],
      },
      'DELETE /api/trials/7/members/2': { status: 204, body: null },
    });
    renderWithApp(<TeamPage trial={trial(['investigator'])} />);
    // The only investigator cannot be removed.
    await screen.findByRole('table', { name: 'Members' });
    expect(screen.queryByRole('button', { name: 'Remove Ines from the trial' })).toBeNull();
    fireEvent.click(screen.getByRole('button', { name: 'Change the role and sites of Cal' }));
    const dialog = await screen.findByRole('dialog');
    fireEvent.click(within(dialog).getByLabelText('Millbrook'));
    fireEvent.click(within(dialog).getByRole('button', { name: 'Save the change' }));
    expect(await within(await screen.findByRole('table', { name: 'Members' })).findByText('Millbrook, Hollow Lane')).toBeInTheDocument();
    const patch = calls.find((c) => c.method === 'PATCH');
    expect(patch?.body).toEqual({ role: 'collaborator', siteIds: [12, 11] });

    fireEvent.click(screen.getByRole('button', { name: 'Remove Cal from the trial' }));
    expect(await screen.findByText(/They lose access at once/)).toBeInTheDocument();
    fireEvent.click(screen.getByRole('button', { name: 'Remove Cal' }));
    await vi.waitFor(() => expect(calls.some((c) => c.method === 'DELETE' && c.path === '/api/trials/7/members/2')).toBe(true));
  });
});
