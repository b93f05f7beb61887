import bcrypt from 'bcryptjs';

/** bcrypt hash of `password` at `cost` (10 in production: about 60 ms here). */
export function hashPassword(password: string, cost: number): Promise<string> {
  return bcrypt.hash(password, cost);
}

/** True when `password` matches `hash`. */
export function verifyPassword(password: string, hash: string): Promise<boolean> {
  return bcrypt.compare(password, hash);
}

const dummyHashes = new Map<number, string>();

/**
 * A hash of no account's password at `cost` (made once per cost), compared against in
 * place of a real account so that every sign-in path spends the same bcrypt time.
 */
export function dummyPasswordHash(cost: number): string {
  let hash = dummyHashes.get(cost);
  if (!hash) {
    hash = bcrypt.hashSync('tackline-no-such-user', cost);
    dummyHashes.set(cost, hash);
  }
  return hash;
}
