import { COLLABORATOR_SAFETY_LINE } from '../invitations/invitation-email';
import { escapeHtml } from '../mail/html-escape';
import type { OutgoingMail } from '../mail/mail.service';
import { personFormats } from '../mail/person-formats';

export interface ReminderEmailFacts {
  to: string;
  personName: string;
  trialCode: string;
  trialTitle: string;
  roundLabel: string;
  /** YYYY-MM-DD */
  dueDate: string;
  /** Each of the person's sites in this trial where the round is due, with its plot-plan link. */
  sites: Array<{ name: string; link: string }>;
  measures: string[];
  safetyNotes: string | null;
  /** The reader's locale for dates (their account's setting); null: day-month-year. */
  locale: string | null;
}

/**
 * Round reminder e-mail — tells a site collaborator that an assessment round is due tomorrow at their site(s),
 * which measures to take, where the plot plan is, and how to work safely. Pure: no I/O, throws nothing.
 * @example reminderEmail({ roundLabel: 'Week 2', trialCode: 'CLAY', sites: [{ name: 'Millbrook', ... }], ... }).subject
 *   // → 'Tomorrow: Week 2 at Millbrook (CLAY)'
 */
export function reminderEmail(facts: ReminderEmailFacts): OutgoingMail {
  const due = personFormats(facts.locale).day(new Date(`${facts.dueDate}T12:00:00Z`));
  const siteNames = facts.sites.map((s) => s.name).join(' and ');
  const measures = facts.measures.length ? facts.measures.join(', ') : 'the measures in the protocol';
  const text = [
    `Hello ${facts.personName},`,
    '',
    `The round "${facts.roundLabel}" of the trial "${facts.trialTitle}" (${facts.trialCode}) is due tomorrow, ${due}, at ${siteNames}.`,
    `Measures to take on every plot: ${measures}.`,
    '',
    ...facts.sites.flatMap((s) => [`Plot plan and data sheets for ${s.name}:`, s.link]),
    '',
    COLLABORATOR_SAFETY_LINE,
    ...(facts.safetyNotes ? ['', `The investigator's safety notes for this trial: ${facts.safetyNotes}`] : []),
    '',
    '— Friable, for replicated garden trials',
  ].join('\n');
  const html = [
    `<p>Hello ${escapeHtml(facts.personName)},</p>`,
    `<p>The round <strong>${escapeHtml(facts.roundLabel)}</strong> of the trial <strong>${escapeHtml(facts.trialTitle)}</strong> (${escapeHtml(facts.trialCode)}) is due tomorrow, ${escapeHtml(due)}, at ${escapeHtml(siteNames)}.</p>`,
    `<p>Measures to take on every plot: ${escapeHtml(measures)}.</p>`,
    `<ul>${facts.sites.map((s) => `<li><a href="${escapeHtml(s.link)}">Plot plan and data sheets for ${escapeHtml(s.name)}</a></li>`).join('')}</ul>`,
    `<p><em>${escapeHtml(COLLABORATOR_SAFETY_LINE)}</em></p>`,
    ...(facts.safetyNotes ? [`<p>The investigator's safety notes for this trial: ${escapeHtml(facts.safetyNotes)}</p>`] : []),
    `<p>— Friable, for replicated garden trials</p>`,
  ].join('\n');
  return { to: facts.to, subject: `Tomorrow: ${facts.roundLabel} at ${siteNames} (${facts.trialCode})`, text, html };
}
