import jwt from 'jsonwebtoken';
import type { Role } from '../../shared/contract/roles';

export interface TokenClaims {
  sub: string;
  role: Role;
  /**
   * The user's session epoch when the token was signed; the token works only while the user row still has it
   * (a password change or reset bumps it). A token signed before epochs existed has none and counts as 0.
   */
  ep?: number;
}

export const TOKEN_TTL_SECONDS = 12 * 60 * 60; // one shift and a half

export function jwtSecret(): string {
  const secret = process.env.JWT_SECRET;
  if (!secret) throw new Error('JWT_SECRET is not set');
  return secret;
}

export function signToken(claims: TokenClaims, secret = jwtSecret(), ttlSeconds = TOKEN_TTL_SECONDS): string {
  return jwt.sign(claims, secret, { algorithm: 'HS256', expiresIn: ttlSeconds, issuer: 'bungwise' });
}

/** A sign-in token for the user as the row is now: their role and their current session epoch. */
export const sessionToken = (user: { id: string; role: Role; sessionEpoch: number }, secret: string) => signToken({ sub: user.id, role: user.role, ep: user.sessionEpoch }, secret);
