import { describe, expect, it } from 'vitest';
import { intakeReceiptEmail } from './receipt-email';

const facts = {
  to: 'ines@example.org',
  uploaderName: 'Ines <Lab>',
  trialCode: 'FW-CLAY-26',
  siteName: 'Hollow Lane',
  roundLabel: 'Day 0',
  fileName: 'day0.csv',
  rowsRead: 25,
  created: 100,
  updated: 1,
  unchanged: 0,
  warningsAccepted: 2,
  committedAt: new Date('2026-05-01T09:30:00Z'),
  link: 'http://127.0.0.1:3000/trials/1/ledger',
  locale: null,
};

describe('intakeReceiptEmail', () => {
  it('names the file, the place and the counts in words', () => {
    const mail = intakeReceiptEmail(facts);
    expect(mail.subject).toBe('Received: FW-CLAY-26, Hollow Lane, Day 0');
    expect(mail.text).toContain('your file day0.csv (25 rows) was saved for Hollow Lane, Day 0, in the trial FW-CLAY-26');
    expect(mail.text).toContain('- 100 new values\n- 1 changed value\n- 0 values unchanged\n- 2 warnings accepted');
  });

  it('writes the counts and the time in the uploader’s locale', () => {
    // CLDR's de-DE grouping and full date as Node 20's ICU prints them.
    const mail = intakeReceiptEmail({ ...facts, rowsRead: 12500, created: 12500, locale: 'de-DE' });
    expect(mail.text).toContain('(12.500 rows)');
    expect(mail.text).toContain('- 12.500 new values');
    expect(mail.text).toContain('on Freitag, 1. Mai 2026 um 09:30 UTC.');
  });

  it('escapes what people typed in the HTML body', () => {
    expect(intakeReceiptEmail(facts).html).toContain('Ines &lt;Lab&gt;');
  });
});
