import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { AccountPage } from './account-page';

const me = { id: 7, email: 'ines@example.org', name: 'Ines Marlow', isAdmin: false, isActive: true, createdAt: '2026-11-01T00:00:00.000Z', locale: null, emailReminders: true, emailReceipts: false, lastSignInAt: null };

describe('AccountPage', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('refuses an empty display name in words and saves the settings as chosen', async () => {
    const calls = mockApi({ 'PATCH /api/users/me': { status: 200, body: { ...me, name: 'Ines M.', locale: 'de-DE' } } });
    renderWithApp(<AccountPage me={me} onSignedOutEverywhere={vi.fn()} />);
    const card = screen.getByRole('generic', { name: 'Name, numbers and e-mails' });
    await userEvent.clear(within(card).getByLabelText('Display name'));
    await userEvent.click(within(card).getByRole('button', { name: 'Save' }));
    expect(await within(card).findByText('Type the name others see on the Team and in the Activity.')).toBeInTheDocument();
    expect(calls).toHaveLength(0);
    await userEvent.type(within(card).getByLabelText('Display name'), ' Ines M. ');
    await userEvent.selectOptions(within(card).getByLabelText('Numbers and dates'), 'de-DE');
    await userEvent.click(within(card).getByLabelText('E-mail me a receipt after each upload'));
    await userEvent.click(within(card).getByRole('button', { name: 'Save' }));
    expect(await within(card).findByText('Saved.')).toBeInTheDocument();
    expect(calls[0]).toMatchObject({ method: 'PATCH', path: '/api/users/me', body: { name: 'Ines M.', locale: 'de-DE', emailReminders: true, emailReceipts: true } });
  });

  it('asks for the current password and a new one of 12 characters typed twice alike, before sending', async () => {
    const calls = mockApi({ 'POST /api/auth/password': { status: 200, body: { message: 'Your password is changed; other devices are signed out.' } } });
    renderWithApp(<AccountPage me={me} onSignedOutEverywhere={vi.fn()} />);
    const card = screen.getByRole('generic', { name: 'Password' });
    await userEvent.type(within(card).getByLabelText('New password'), 'too short');
    await userEvent.type(within(card).getByLabelText('New password again'), 'too shorts');
    await userEvent.click(within(card).getByRole('button', { name: 'Change the password' }));
    expect(await within(card).findByText('Type your current password.')).toBeInTheDocument();
    expect(within(card).getByText('A password needs at least 12 characters.')).toBeInTheDocument();
    expect(within(card).getByText('The two new passwords differ.')).toBeInTheDocument();
    expect(calls).toHaveLength(0);
    await userEvent.type(within(card).getByLabelText('Current password'), 'old-password-1');
    await userEvent.clear(within(card).getByLabelText('New password'));
    await userEvent.type(within(card).getByLabelText('New password'), 'loam clay sage walk');
    await userEvent.clear(within(card).getByLabelText('New password again'));
    await userEvent.type(within(card).getByLabelText('New password again'), 'loam clay sage walk');
    await userEvent.click(within(card).getByRole('button', { name: 'Change the password' }));
    expect(await within(card).findByText('Your password is changed; other devices are signed out.')).toBeInTheDocument();
    expect(calls[0]?.body).toEqual({ currentPassword: 'old-password-1', newPassword: 'loam clay sage walk' });
    expect(within(card).getByLabelText('Current password')).toHaveValue('');
  });
});
