import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { PeoplePage } from './people-page';

const admin = { id: 1, email: 'admin@example.org', name: 'Avery Quill', isAdmin: true, isActive: true, createdAt: '2026-12-01T00:00:00.000Z', locale: null, emailReminders: true, emailReceipts: true, lastSignInAt: null };
const grower = { id: 7, email: 'grower@example.org', name: 'Gale Moss', isAdmin: false, isActive: true, createdAt: '2026-11-20T00:00:00.000Z', locale: null, emailReminders: true, emailReceipts: true, lastSignInAt: null };
const gone = { id: 8, email: 'gone@example.org', name: 'Former Member', isAdmin: false, isActive: false, createdAt: '2026-10-02T00:00:00.000Z', locale: null, emailReminders: true, emailReceipts: true, lastSignInAt: null };

describe('PeoplePage', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('lists every account with its state, and nothing to do on one’s own row', async () => {
    mockApi({ 'GET /api/users': { status: 200, body: [admin, { ...grower, lastSignInAt: '2026-12-01T09:30:00.000Z' }, gone] } });
    renderWithApp(<PeoplePage me={admin} />);
    const table = await screen.findByRole('table', { name: 'Accounts' });
    const rows = within(table).getAllByRole('row');
    expect(rows[1]).toHaveTextContent('Avery Quill');
    expect(rows[1]).toHaveTextContent('admin@example.org');
    expect(within(rows[1]).getByText('Administrator')).toBeInTheDocument();
    expect(within(rows[1]).getByText('you')).toBeInTheDocument();
    expect(within(rows[2]).getByRole('button', { name: 'Deactivate Gale Moss' })).toBeInTheDocument();
    expect(within(table).getByRole('columnheader', { name: 'Last sign-in' })).toBeInTheDocument();
    expect(within(rows[2]).getByText('1 Dec 2026')).toBeInTheDocument();
    expect(within(rows[3]).getByText('never')).toBeInTheDocument();
    expect(within(rows[3]).getByText('Deactivated')).toBeInTheDocument();
    expect(within(rows[3]).getByRole('button', { name: 'Reactivate Former Member' })).toBeInTheDocument();
  });

  it('asks before deactivating, then calls the API', async () => {
    const calls = mockApi({
      'GET /api/users': { status: 200, body: [admin, grower] },
      'POST /api/users/7/deactivate': { status: 200, body: { ...grower, isActive: false } },
    });
    renderWithApp(<PeoplePage me={admin} />);
    await userEvent.click(await screen.findByRole('button', { name: 'Deactivate Gale Moss' }));
    expect(screen.getByText(/will be signed out at once/)).toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Deactivate' }));
    await vi.waitFor(() => expect(calls.some((c) => c.method === 'POST' && c.path === '/api/users/7/deactivate')).toBe(true));
  });

  it('shows the server’s message beside the field it names', async () => {
    const calls = mockApi({
      'GET /api/users': { status: 200, body: [admin] },
      'POST /api/users': {
        status: 422,
        body: { statusCode: 422, error: 'Unprocessable Entity', message: 'Please correct: password must be at least 12 characters long.', errors: [{ field: 'password', message: 'password must be at least 12 characters long' }] },
      },
    });
    renderWithApp(<PeoplePage me={admin} />);
    await userEvent.type(await screen.findByLabelText('Name'), 'New Grower');
    await userEvent.type(screen.getByLabelText('E-mail'), 'new@example.org');
    await userEvent.type(screen.getByLabelText('Password'), 'short');
    await userEvent.click(screen.getByRole('button', { name: 'Add account' }));
    expect(await screen.findByText('password must be at least 12 characters long')).toBeInTheDocument();
    expect(calls.find((c) => c.method === 'POST')?.body).toEqual({ email: 'new@example.org', name: 'New Grower', password: 'short', isAdmin: false });
  });

  it('tells a person who is not an administrator that the page is not for them', () => {
    mockApi({});
    renderWithApp(<PeoplePage me={grower} />);
    expect(screen.getByText('For instance administrators')).toBeInTheDocument();
  });
});
