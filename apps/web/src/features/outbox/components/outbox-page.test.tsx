import { fireEvent, screen } from '@testing-library/react';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { OutboxPage } from './outbox-page';

const person = { id: 1, email: 'ines@example.org', name: 'Ines', isAdmin: false, isActive: true, createdAt: '2026-12-01T00:00:00.000Z' };
const mail = (id: string, subject: string, text: string) => ({
  id,
  receivedAt: '2026-12-01T10:00:00.000Z',
  from: 'Friable <no-reply@example.org>',
  to: [`${id}@example.org`],
  subject,
  text,
  html: `<p>${text}</p>`,
});

describe('OutboxPage', () => {
  beforeEach(() => window.localStorage.setItem('friable.signedIn', '1'));
  afterEach(() => vi.unstubAllGlobals());

  it('opens the newest e-mail with its link clickable, and the others on request', async () => {
    mockApi({
      'GET /api/auth/me': { status: 200, body: person },
      'GET /api/dev/outbox': {
        status: 200,
        body: [mail('new', 'Ines invites you', 'Open http://127.0.0.1:3000/invitations/abc to accept.'), mail('old', 'Tomorrow: Week 2', 'Due tomorrow.')],
      },
    });
    renderWithApp(<OutboxPage />);
    expect(await screen.findByRole('link', { name: 'http://127.0.0.1:3000/invitations/abc' })).toHaveAttribute('href', 'http://127.0.0.1:3000/invitations/abc');
    expect(screen.getByText('old@example.org')).toBeInTheDocument();
    expect(screen.queryByText('Due tomorrow.')).not.toBeInTheDocument();
    fireEvent.click(screen.getByRole('button', { name: 'Show the e-mail “Tomorrow: Week 2” to old@example.org' }));
    expect(screen.getByText('Due tomorrow.')).toBeInTheDocument();
  });

  it('says so when nothing has been sent', async () => {
    mockApi({ 'GET /api/auth/me': { status: 200, body: person }, 'GET /api/dev/outbox': { status: 200, body: [] } });
    renderWithApp(<OutboxPage />);
    expect(await screen.findByText('No e-mails yet')).toBeInTheDocument();
  });
});
