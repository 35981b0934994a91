import jwt from 'jsonwebtoken';
import type { Role } from '../../shared/roles';

export interface TokenClaims {
  sub: string;
  role: Role;
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
