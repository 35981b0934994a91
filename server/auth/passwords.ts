import bcrypt from 'bcryptjs';
import { createHash, randomBytes, randomInt } from 'node:crypto';

export const hashPassword = (password: string) => bcrypt.hash(password, 10);
export const verifyPassword = (password: string, hash: string) => bcrypt.compare(password, hash);

// No 0/O, 1/l/I: a temporary password is read off a screen and typed on a phone, often with gloves on.
const TEMPORARY_ALPHABET = 'abcdefghjkmnpqrstuvwxyz23456789';

/** Three groups of four from a 31-letter alphabet (59 bits), e.g. "k7pm-3xq9-tr4w": passes the password rule. */
export function temporaryPassword(): string {
  const group = () => Array.from({ length: 4 }, () => TEMPORARY_ALPHABET[randomInt(TEMPORARY_ALPHABET.length)]).join('');
  return [group(), group(), group()].join('-');
}

/** A reset link's secret (256 bits) and the hash that is all the database keeps of it. */
export function newResetToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashResetToken(token) };
}

// SHA-256 without a salt is enough here: the token is random and long, so there is nothing to look up.
export const hashResetToken = (token: string) => createHash('sha256').update(token, 'utf8').digest('hex');
