import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { mockApi, renderWithApp } from '../../../test/render';
import { ForgotPasswordPage, ResetPasswordPage } from './password-reset-pages';

describe('ForgotPasswordPage', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('asks for an e-mail address in words, then sends the trimmed address and shows the server’s answer', async () => {
    const calls = mockApi({ 'POST /api/auth/password-reset': { status: 200, body: { message: 'If that address has an account, a link is on its way.' } } });
    renderWithApp(<ForgotPasswordPage />);
    await userEvent.click(screen.getByRole('button', { name: 'E-mail me a link' }));
    expect(await screen.findByText('Type an e-mail address.')).toBeInTheDocument();
    await userEvent.type(screen.getByLabelText('E-mail'), 'not-an-address');
    await userEvent.click(screen.getByRole('button', { name: 'E-mail me a link' }));
    expect(await screen.findByText('That does not look like an e-mail address, e.g. name@example.org.')).toBeInTheDocument();
    expect(calls).toHaveLength(0);
    await userEvent.clear(screen.getByLabelText('E-mail'));
    await userEvent.type(screen.getByLabelText('E-mail'), '  ines@example.org ');
    await userEvent.click(screen.getByRole('button', { name: 'E-mail me a link' }));
    expect(await screen.findByText('If that address has an account, a link is on its way.')).toBeInTheDocument();
    expect(calls[0]).toMatchObject({ method: 'POST', body: { email: 'ines@example.org' } });
  });
});

describe('ResetPasswordPage', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('refuses a short password and two that differ beside their boxes, and sends neither', async () => {
    const calls = mockApi({});
    renderWithApp(<ResetPasswordPage token="t0ken" />);
    await userEvent.type(screen.getByLabelText('New password'), 'short');
    await userEvent.type(screen.getByLabelText('New password again'), 'shorter');
    await userEvent.click(screen.getByRole('button', { name: 'Set the new password' }));
    expect(await screen.findByText('A password needs at least 12 characters.')).toBeInTheDocument();
    expect(screen.getByText('The two passwords differ.')).toBeInTheDocument();
    expect(calls).toHaveLength(0);
  });

  it('sends the token and the new password, and shows the server’s refusal of a common one beside the box', async () => {
    const calls = mockApi({
      'POST /api/auth/password-reset/confirm': {
        status: 422,
        body: { statusCode: 422, error: 'Unprocessable Entity', message: 'The password is too common.', errors: [{ field: 'password', message: 'This password is one of the most common; choose another.' }] },
      },
    });
    renderWithApp(<ResetPasswordPage token="t0ken" />);
    await userEvent.type(screen.getByLabelText('New password'), 'password1234');
    await userEvent.type(screen.getByLabelText('New password again'), 'password1234');
    await userEvent.click(screen.getByRole('button', { name: 'Set the new password' }));
    expect(await screen.findByText('This password is one of the most common; choose another.')).toBeInTheDocument();
    expect(calls[0]).toMatchObject({ method: 'POST', body: { token: 't0ken', password: 'password1234' } });
  });
});
