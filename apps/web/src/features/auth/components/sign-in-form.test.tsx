import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { SignInForm } from './sign-in-form';

const person = { id: 2, email: 'ines@example.org', name: 'Ines Marlow', isAdmin: false, isActive: true, createdAt: '2026-12-01T00:00:00.000Z' };

describe('SignInForm', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('shows the server’s own sentence when the password is wrong', async () => {
    mockApi({ 'POST /api/auth/login': { status: 401, body: { statusCode: 401, error: 'Unauthorized', message: 'The e-mail or password is not right.' } } });
    const onSignedIn = vi.fn();
    renderWithApp(<SignInForm onSignedIn={onSignedIn} />);
    await userEvent.type(screen.getByLabelText('E-mail'), 'ines@example.org');
    await userEvent.type(screen.getByLabelText('Password'), 'wrong');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText('The e-mail or password is not right.')).toBeInTheDocument();
    expect(screen.getByText('Not signed in')).toBeInTheDocument();
    expect(onSignedIn).not.toHaveBeenCalled();
  });

  it('stores the token and reports success', async () => {
    const calls = mockApi({ 'POST /api/auth/login': { status: 200, body: { accessToken: 'a.b.c', tokenType: 'Bearer', expiresIn: 60, user: person } } });
    const onSignedIn = vi.fn();
    renderWithApp(<SignInForm onSignedIn={onSignedIn} />);
    await userEvent.type(screen.getByLabelText('E-mail'), 'ines@example.org');
    await userEvent.type(screen.getByLabelText('Password'), 'friable-demo');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    await vi.waitFor(() => expect(onSignedIn).toHaveBeenCalledOnce());
    expect(calls[0]).toMatchObject({ method: 'POST', path: '/api/auth/login', body: { email: 'ines@example.org', password: 'friable-demo' } });
    expect(window.localStorage.getItem('friable.signedIn')).toBe('1');
  });

  it('says so when the server cannot be reached', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => Promise.reject(new TypeError('Failed to fetch'))));
    renderWithApp(<SignInForm onSignedIn={vi.fn()} />);
    await userEvent.type(screen.getByLabelText('E-mail'), 'ines@example.org');
    await userEvent.type(screen.getByLabelText('Password'), 'x');
    await userEvent.click(screen.getByRole('button', { name: 'Sign in' }));
    expect(await screen.findByText(/Friable cannot reach its server/)).toBeInTheDocument();
  });
});
