/** Password hashing with bcrypt (bcryptjs). */
import bcrypt from 'bcryptjs';
import { randomBytes } from 'node:crypto';

export function hashPassword(password: string, rounds: number): Promise<string> {
  return bcrypt.hash(password, rounds);
}

// Compared against when the email is unknown, so a miss takes as long as a wrong password.
const DUMMY_HASH = bcrypt.hashSync(randomBytes(16).toString('hex'), 10);

/** True when `password` matches `hash`; with no hash, spends the same time and returns false. */
export async function checkPassword(password: string, hash: string | undefined): Promise<boolean> {
  const ok = await bcrypt.compare(password, hash ?? DUMMY_HASH);
  return ok && hash !== undefined;
}

/** A password for a generated account: 18 characters from base64url. */
export function generatePassword(): string {
  return randomBytes(14).toString('base64url').slice(0, 18);
}
