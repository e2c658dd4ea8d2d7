import bcrypt from "bcryptjs";

/** bcrypt cost: 2^12 rounds, about a quarter of a second per hash on a small server. */
export const BCRYPT_COST = 12;

export const PASSWORD_MIN = 10;
export const PASSWORD_MAX = 72; // bcrypt reads only the first 72 bytes

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_COST);
}

let dummyHash: Promise<string> | undefined;

/**
 * Compares a password with a stored hash. With no hash (no such account) it still compares against a
 * throwaway hash of the same cost, so an unknown address takes as long as a wrong password.
 */
export async function verifyPassword(password: string, hash: string | null): Promise<boolean> {
  if (hash) return bcrypt.compare(password, hash);
  dummyHash ??= bcrypt.hash("spanlark-no-such-account", BCRYPT_COST);
  await bcrypt.compare(password, await dummyHash);
  return false;
}

export function hashCost(hash: string): number {
  return bcrypt.getRounds(hash);
}
