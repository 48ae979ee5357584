import { createHash, randomBytes } from 'node:crypto';

/** A fresh URL-safe token (256 bits) and the hash that is all the database keeps of it. */
export function newToken(): { token: string; tokenHash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, tokenHash: hashToken(token) };
}

export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
