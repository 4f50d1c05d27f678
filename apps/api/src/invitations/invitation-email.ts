import type { TrialRole } from '@friable/contracts';
import { escapeHtml } from '../mail/html-escape';
import type { OutgoingMail } from '../mail/mail.service';

export interface InvitationEmailFacts {
  to: string;
  inviterName: string | null;
  trialCode: string;
  trialTitle: string;
  role: TrialRole;
  siteName: string | null;
  message: string | null;
  link: string;
  expiresAt: Date;
}

const roleWords: Record<TrialRole, string> = {
  investigator: 'an investigator (you will manage the protocol, the sites and the team)',
  collaborator: 'a site collaborator (you will run the trial at your garden and record its data)',
  reviewer: 'a reviewer (you will read the protocol, data and findings, and may comment and sign off)',
};

export const COLLABORATOR_SAFETY_LINE =
  'Working safely: wear gloves when handling compost or manure and wash your hands afterwards, wear a mask and eye protection ' +
  'when spreading gypsum, lime or other dusty powders, lift wet soil and full containers with your legs and ask for help with heavy loads, ' +
  'and follow product labels and your local rules.';

const expiryFormat = new Intl.DateTimeFormat('en-GB', { dateStyle: 'full', timeStyle: 'short', timeZone: 'UTC' });

/**
 * Invitation e-mail — the plain-text and HTML message that invites a person to a trial.
 * Says who invited them, to which trial, with which role and site, the link and when it expires;
 * collaborators also get a short safety line. Pure: no I/O, throws nothing.
 * @example invitationEmail({ to: 'a@example.org', inviterName: 'Ines', trialCode: 'CLAY', ... }).subject
 *   // → 'Ines invites you to the trial CLAY on Friable'
 */
export function invitationEmail(facts: InvitationEmailFacts): OutgoingMail {
  const who = facts.inviterName ?? 'The investigator';
  const expires = `${expiryFormat.format(facts.expiresAt)} UTC`;
  const where = facts.siteName ? ` at ${facts.siteName}` : '';
  const lines = [
    `Hello,`,
    '',
    `${who} invites you to join the trial "${facts.trialTitle}" (${facts.trialCode}) on Friable as ${roleWords[facts.role]}${where}.`,
    ...(facts.message ? ['', `${who} writes:`, facts.message] : []),
    '',
    'Open this link to accept. You can set your name and a password, or join with the Friable account you already have for this address:',
    facts.link,
    '',
    `The link works once and expires on ${expires}. If you were not expecting this e-mail, you can ignore it.`,
    ...(facts.role === 'collaborator' ? ['', COLLABORATOR_SAFETY_LINE] : []),
    '',
    '— Friable, for replicated garden trials',
  ];
  const html = [
    `<p>Hello,</p>`,
    `<p>${escapeHtml(who)} invites you to join the trial <strong>${escapeHtml(facts.trialTitle)}</strong> (${escapeHtml(facts.trialCode)}) on Friable as ${escapeHtml(roleWords[facts.role])}${escapeHtml(where)}.</p>`,
    ...(facts.message ? [`<blockquote>${escapeHtml(facts.message).replace(/\n/g, '<br>')}</blockquote>`] : []),
    `<p><a href="${escapeHtml(facts.link)}">Accept the invitation</a></p>`,
    `<p>The link works once and expires on ${escapeHtml(expires)}. If you were not expecting this e-mail, you can ignore it.</p>`,
    ...(facts.role === 'collaborator' ? [`<p><em>${escapeHtml(COLLABORATOR_SAFETY_LINE)}</em></p>`] : []),
    `<p>— Friable, for replicated garden trials</p>`,
  ].join('\n');
  return { to: facts.to, subject: `${who} invites you to the trial ${facts.trialCode} on Friable`, text: lines.join('\n'), html };
}
