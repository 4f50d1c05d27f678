import { escapeHtml } from '../mail/html-escape';
import type { OutgoingMail } from '../mail/mail.service';
import { personFormats } from '../mail/person-formats';

export interface IntakeReceiptFacts {
  to: string;
  uploaderName: string;
  trialCode: string;
  siteName: string;
  roundLabel: string;
  fileName: string;
  rowsRead: number;
  created: number;
  updated: number;
  unchanged: number;
  warningsAccepted: number;
  committedAt: Date;
  /** Where the uploader sees the values (the trial's Ledger). */
  link: string;
  /** The uploader's locale for the counts and the time (their account's setting); null: the plain forms. */
  locale: string | null;
}


/**
 * Intake receipt e-mail — the message an uploader gets after a file was committed: which file,
 * for which trial, site and round, how many values are new, changed and unchanged, and how many
 * warnings were accepted. Pure: no I/O, throws nothing.
 * @example intakeReceiptEmail({ to: 'a@example.org', trialCode: 'FW-CLAY-26', siteName: 'Hollow Lane', roundLabel: 'Day 0', … }).subject
 *   // → 'Received: FW-CLAY-26, Hollow Lane, Day 0'
 */
export function intakeReceiptEmail(facts: IntakeReceiptFacts): OutgoingMail {
  const formats = personFormats(facts.locale);
  const plural = (value: number, one: string, many: string) => `${formats.count(value)} ${value === 1 ? one : many}`;
  const when = formats.moment(facts.committedAt);
  const lines = [
    `${plural(facts.created, 'new value', 'new values')}`,
    `${plural(facts.updated, 'changed value', 'changed values')}`,
    `${plural(facts.unchanged, 'value unchanged', 'values unchanged')}`,
    ...(facts.warningsAccepted ? [`${plural(facts.warningsAccepted, 'warning', 'warnings')} accepted (values kept as typed)`] : []),
  ];
  const intro = `Hello ${facts.uploaderName}, your file ${facts.fileName} (${plural(facts.rowsRead, 'row', 'rows')}) was saved for ${facts.siteName}, ${facts.roundLabel}, in the trial ${facts.trialCode} on ${when}.`;
  const text = [intro, '', ...lines.map((line) => `- ${line}`), '', `Every change is in the value's history. See the values: ${facts.link}`, '', 'Friable'].join('\n');
  const html = [
    `<p>${escapeHtml(intro)}</p>`,
    `<ul>${lines.map((line) => `<li>${escapeHtml(line)}</li>`).join('')}</ul>`,
    `<p>Every change is in the value's history. <a href="${escapeHtml(facts.link)}">See the values</a>.</p>`,
    '<p>Friable</p>',
  ].join('\n');
  return { to: facts.to, subject: `Received: ${facts.trialCode}, ${facts.siteName}, ${facts.roundLabel}`, text, html };
}
