import { createHash, randomBytes } from 'node:crypto';

/** 32 random bytes (256 bits), base64url: 43 characters. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

/** SHA-256 hex of a token; only this is stored, so a database copy cannot open links or resets. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
