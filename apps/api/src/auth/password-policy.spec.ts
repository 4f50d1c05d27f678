import { describe, expect, it } from 'vitest';
import { PASSWORD_MIN_LENGTH, passwordProblem } from './password-policy';

describe('passwordProblem (NIST SP 800-63B §5.1.1.2)', () => {
  it('refuses 1234567890 for its length', () => {
    expect(passwordProblem('1234567890')).toBe('The password must be at least 12 characters long; it has 10.');
  });

  it('counts characters, not bytes, for the minimum', () => {
    expect(PASSWORD_MIN_LENGTH).toBe(12);
    expect(passwordProblem('ééééé ééééé')).toMatch(/at least 12 characters long; it has 11/);
  });

  it('accepts a long passphrase without digits or symbols (length over composition)', () => {
    expect(passwordProblem('correct horse battery')).toBeNull();
    expect(passwordProblem('friable-demo')).toBeNull();
  });

  it('refuses common passwords from the bundled list, also with digits and symbols around them', () => {
    expect(passwordProblem('qwerty123456')).toMatch(/most common passwords/);
    expect(passwordProblem('1qaz2wsx3edc')).toMatch(/most common passwords/);
    expect(passwordProblem('Password2026!')).toMatch(/most common passwords/);
    expect(passwordProblem('baseball1234')).toMatch(/most common passwords/);
  });

  it('refuses repeated and sequential runs', () => {
    expect(passwordProblem('aaaaaaaaaaaa')).toMatch(/repeated or sequential/);
    expect(passwordProblem('abcdefghijklm')).toMatch(/repeated or sequential/);
    expect(passwordProblem('ab1ab1ab1ab1')).toMatch(/repeated or sequential/);
  });

  it('refuses the service name and the person’s own e-mail or name', () => {
    expect(passwordProblem('friable2026!!')).toMatch(/name of this service/);
    expect(passwordProblem('robin.ash@example.org', { email: 'robin.ash@example.org' })).toMatch(/your e-mail address/);
    expect(passwordProblem('RobinAshcroft99', { name: 'Robin Ashcroft' })).toMatch(/your name/);
  });

  it('refuses more than 64 characters or 72 bytes, which bcrypt would cut', () => {
    expect(passwordProblem('a b'.repeat(22))).toMatch(/at most 64 characters/);
    expect(passwordProblem('ü'.repeat(40))).toMatch(/72 bytes/);
  });
});
