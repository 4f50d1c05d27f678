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
};

describe('intakeReceiptEmail', () => {
  it('names the file, the place and the counts in words', () => {
    const mail = intakeReceiptEmail(facts);
    expect(mail.subject).toBe('Received: FW-CLAY-26, Hollow Lane, Day 0');
    expect(mail.text).toContain('your file day0.csv (25 rows) was saved for Hollow Lane, Day 0, in the trial FW-CLAY-26');
    expect(mail.text).toContain('- 100 new values\n- 1 changed value\n- 0 values unchanged\n- 2 warnings accepted');
  });

  it('escapes what people typed in the HTML body', () => {
    expect(intakeReceiptEmail(facts).html).toContain('Ines &lt;Lab&gt;');
  });
});
