import type { TrialDetail } from '@friable/contracts';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { InviteForm } from './invite-form';

const trial = { id: 7, code: 'CLAY', title: 'Clay trial', myRoles: ['investigator'], mySiteIds: [], sites: [{ id: 11, name: 'Millbrook' }] } as unknown as TrialDetail;

describe('InviteForm', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('asks for an address and, for a collaborator, a site, in words beside the boxes, before anything is sent', async () => {
    const calls = mockApi({});
    renderWithApp(<InviteForm trial={trial} />);
    await userEvent.click(screen.getByRole('button', { name: 'Send invitation' }));
    expect(await screen.findByText('Type an e-mail address.')).toBeInTheDocument();
    expect(screen.getByText('Choose the site this collaborator will run.')).toBeInTheDocument();
    await userEvent.type(screen.getByLabelText('E-mail'), 'robin@');
    await userEvent.click(screen.getByRole('button', { name: 'Send invitation' }));
    expect(await screen.findByText('That does not look like an e-mail address, e.g. name@example.org.')).toBeInTheDocument();
    expect(calls).toHaveLength(0);
  });

  it('sends a reviewer without a site, with the note trimmed, and says who was invited', async () => {
    const calls = mockApi({ 'POST /api/trials/7/invitations': { status: 201, body: { id: 5, email: 'vera@example.org', role: 'reviewer', siteId: null } } });
    renderWithApp(<InviteForm trial={trial} />);
    await userEvent.type(screen.getByLabelText('E-mail'), 'vera@example.org');
    await userEvent.selectOptions(screen.getByLabelText('Role'), 'reviewer');
    expect(screen.queryByLabelText('Site')).not.toBeInTheDocument();
    await userEvent.type(screen.getByLabelText('Personal note (optional)'), '  Your eyes on the numbers, please. ');
    await userEvent.click(screen.getByRole('button', { name: 'Send invitation' }));
    expect(await screen.findByText('Invitation sent to vera@example.org.')).toBeInTheDocument();
    expect(calls[0]?.body).toEqual({ email: 'vera@example.org', role: 'reviewer', siteId: null, message: 'Your eyes on the numbers, please.' });
    expect(screen.getByLabelText('E-mail')).toHaveValue('');
  });
});
