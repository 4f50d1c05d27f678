import { escapeHtml } from '../mail/html-escape';
import type { OutgoingMail } from '../mail/mail.service';
import { personFormats } from '../mail/person-formats';


/**
 * Password-reset e-mail — the link to choose a new password, when it stops working, and what to do if
 * the person did not ask. Pure: no I/O, throws nothing.
 * @example passwordResetEmail({ to: 'a@example.org', name: 'Robin', link: 'https://…/reset-password/x', expiresAt }).subject
 *   // → 'Choose a new Friable password'
 */
export function passwordResetEmail(facts: { to: string; name: string; link: string; expiresAt: Date; ttlMinutes: number; locale: string | null }): OutgoingMail {
  const expires = personFormats(facts.locale).moment(facts.expiresAt);
  const lines = [
    `Hello ${facts.name},`,
    '',
    'Someone (we hope you) asked to reset the password of your Friable account. Open this link to choose a new one:',
    facts.link,
    '',
    `The link works once, for ${facts.ttlMinutes} minutes (until ${expires}). Choosing a new password signs you out everywhere.`,
    'If you did not ask, ignore this e-mail: your password stays as it is.',
    '',
    '— Friable, for replicated garden trials',
  ];
  const html = [
    `<p>Hello ${escapeHtml(facts.name)},</p>`,
    '<p>Someone (we hope you) asked to reset the password of your Friable account.</p>',
    `<p><a href="${escapeHtml(facts.link)}">Choose a new password</a></p>`,
    `<p>The link works once, for ${facts.ttlMinutes} minutes (until ${escapeHtml(expires)}). Choosing a new password signs you out everywhere.</p>`,
    '<p>If you did not ask, ignore this e-mail: your password stays as it is.</p>',
  ];
  return { to: facts.to, subject: 'Choose a new Friable password', text: lines.join('\n'), html: html.join('\n') };
}
