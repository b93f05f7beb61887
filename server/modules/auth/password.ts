import bcrypt from 'bcryptjs';

/** bcrypt hash of `password` at `cost` (10 in production: about 60 ms here). */
export function hashPassword(password: string, cost: number): Promise<string> {
  return bcrypt.hash(password, cost);
}

/** True when `password` matches `hash`. */
export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

// Compared against when no account matches, so an unknown e-mail costs as much time as
// a wrong password and the two cannot be told apart by timing.
const DUMMY_HASH = bcrypt.hashSync('tackline-no-such-user', 10);

/** Spends a bcrypt comparison's time without a real account. */
export async function burnPasswordCheck(password: string): Promise<void> {
  await bcrypt.compare(password, DUMMY_HASH);
}
