import { escapeHtml } from './html-escape';
import type { OutgoingMail } from './mail.service';

export interface NoticeFacts {
  to: string;
  subject: string;
  /** Plain sentences, one paragraph each. */
  paragraphs: string[];
  link?: { href: string; label: string };
}

/**
 * Notice e-mail — a short message of plain paragraphs and at most one link, as text and HTML (escaped).
 * Pure: no I/O, throws nothing.
 * @example noticeEmail({ to: 'a@example.org', subject: 'Your role changed', paragraphs: ['Hello,'] }).text // → 'Hello,\n\n— Friable, …'
 */
export function noticeEmail(facts: NoticeFacts): OutgoingMail {
  const footer = '— Friable, for replicated garden trials';
  const text = [...facts.paragraphs, ...(facts.link ? [`${facts.link.label}: ${facts.link.href}`] : []), footer].join('\n\n');
  const html = [
    ...facts.paragraphs.map((p) => `<p>${escapeHtml(p).replace(/\n/g, '<br>')}</p>`),
    ...(facts.link ? [`<p><a href="${escapeHtml(facts.link.href)}">${escapeHtml(facts.link.label)}</a></p>`] : []),
    `<p>${escapeHtml(footer)}</p>`,
  ].join('\n');
  return { to: facts.to, subject: facts.subject, text, html };
}
