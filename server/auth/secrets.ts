import bcrypt from 'bcryptjs';
import { createHash, randomBytes } from 'node:crypto';

// Cost 11 keeps a sign-in near 0.1 s on the hub's small machine while staying above OWASP's floor of 10.
const BCRYPT_COST = 11;

// Compared against when the e-mail is unknown, so a wrong e-mail takes as long as a wrong password.
const DUMMY_HASH = bcrypt.hashSync('not a real password', BCRYPT_COST);

/** Hashes a password or PIN for storage. */
export function hashSecret(secret: string): Promise<string> {
  return bcrypt.hash(secret, BCRYPT_COST);
}

/** Checks a password or PIN against its stored hash; a missing hash still costs a full compare. */
export async function verifySecret(secret: string, hash: string | null): Promise<boolean> {
  const matches = await bcrypt.compare(secret, hash ?? DUMMY_HASH);
  return matches && hash !== null;
}

/** A device token for a station tablet or wall display: 256 random bits, URL-safe. */
export function newDeviceToken(): string {
  return randomBytes(32).toString('base64url');
}

/** What the hub keeps of a device token. A fast hash is enough: the token is random, not chosen by a person. */
export function hashDeviceToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
