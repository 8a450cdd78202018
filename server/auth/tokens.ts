import { createHash, randomBytes } from 'node:crypto';

/** A fresh 256-bit token for a mailed link, URL-safe (43 characters). */
export function newLinkToken(): string {
  return randomBytes(32).toString('base64url');
}

/**
 * The form a link token is stored in. A plain SHA-256 is enough here (no salt or slow hash):
 * the token already has 256 bits of entropy, so there is nothing to brute-force.
 */
export function hashLinkToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}
