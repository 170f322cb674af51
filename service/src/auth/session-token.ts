import { createHash } from 'node:crypto';

/** What a sign-in token carries: the user, and a fingerprint of the password it was issued for. */
export interface SessionClaims {
  sub: string;
  pwv: string;
}

/**
 * A short fingerprint of the stored password hash (sha256, 72 bits, base64url). Every token
 * carries the fingerprint of the password it was issued for, and the guard compares it with the
 * account's current one: changing or resetting a password ends every session opened with the
 * old password. It reveals nothing usable about the password (a hash of a salted bcrypt hash).
 */
export function passwordFingerprint(passwordHash: string): string {
  return createHash('sha256').update(passwordHash).digest('base64url').slice(0, 12);
}
