import { hashResetToken, newResetToken, temporaryPassword } from '../../server/auth/passwords';
import { MIN_PASSWORD_LENGTH, passwordProblem } from '../../shared/passwords';

describe('the password rule (shared by the forms and the server)', () => {
  it('asks for at least 12 characters, at most 200, and refuses the common ones whatever their case', () => {
    expect(MIN_PASSWORD_LENGTH).toBe(12);
    expect(passwordProblem('a'.repeat(11))).toBe('must be at least 12 characters');
    expect(passwordProblem('quarry-lantern')).toBeNull();
    expect(passwordProblem('x'.repeat(200))).toBeNull();
    expect(passwordProblem('x'.repeat(201))).toBe('must be at most 200 characters');
    expect(passwordProblem('PassWord1234')).toBe('is too common; choose another');
  });
});

describe('a temporary password from an administrator’s reset', () => {
  it('passes the rule, avoids look-alike letters, and differs each time', () => {
    const made = Array.from({ length: 200 }, temporaryPassword);
    for (const p of made) {
      expect(p).toMatch(/^[a-z2-9]{4}-[a-z2-9]{4}-[a-z2-9]{4}$/);
      expect(p).not.toMatch(/[01ilo]/);
      expect(passwordProblem(p)).toBeNull();
    }
    expect(new Set(made).size).toBe(made.length);
  });
});

describe('a reset link token', () => {
  it('is 256 random bits in base64url, and only its SHA-256 is kept', () => {
    const { token, hash } = newResetToken();
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(hash).toBe(hashResetToken(token));
    expect(hash).toMatch(/^[0-9a-f]{64}$/);
    expect(hash).not.toContain(token);
    // SHA-256 of "abc" (FIPS 180-2, appendix B.1) [pub]
    expect(hashResetToken('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
    expect(newResetToken().token).not.toBe(token);
  });
});
