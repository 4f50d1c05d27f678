import { describe, expect, it } from 'vitest';
import { invitationEmail } from './invitation-email';

const facts = {
  to: 'robin@example.org',
  inviterName: 'Ines <Lead>',
  trialCode: 'CLAY',
  trialTitle: 'Gypsum & compost on clay',
  role: 'collaborator' as const,
  siteName: 'Millbrook',
  message: 'See you at the allotment.',
  link: 'http://127.0.0.1:3000/invitations/abc',
  expiresAt: new Date('2026-12-08T10:00:00Z'),
};

describe('invitationEmail', () => {
  it('says who invites, to which trial, role and site, the link, the expiry, and how to work safely', () => {
    const mail = invitationEmail(facts);
    expect(mail.subject).toBe('Ines <Lead> invites you to the trial CLAY on Friable');
    expect(mail.text).toContain('Ines <Lead> invites you to join the trial "Gypsum & compost on clay" (CLAY) on Friable as a site collaborator');
    expect(mail.text).toContain('at Millbrook.');
    expect(mail.text).toContain('See you at the allotment.');
    expect(mail.text).toContain('http://127.0.0.1:3000/invitations/abc');
    expect(mail.text).toContain('expires on Tuesday, 8 December 2026 at 10:00 UTC');
    expect(mail.text).toMatch(/gloves .* compost or manure .* mask .* lift wet soil .* local rules/);
  });

  it('escapes what people typed in the HTML version', () => {
    const { html } = invitationEmail(facts);
    expect(html).toContain('Ines &lt;Lead&gt;');
    expect(html).toContain('Gypsum &amp; compost on clay');
    expect(html).toContain('<a href="http://127.0.0.1:3000/invitations/abc">');
  });

  it('leaves the safety line out for reviewers', () => {
    const mail = invitationEmail({ ...facts, role: 'reviewer', siteName: null, message: null });
    expect(mail.text).not.toContain('gloves');
    expect(mail.text).toContain('as a reviewer');
  });
});
