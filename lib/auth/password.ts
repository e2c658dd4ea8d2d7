import bcrypt from "bcryptjs";
import { passwordGate } from "./password-gate";

/** bcrypt cost: 2^12 rounds, about a quarter of a second per hash on a small server. */
export const BCRYPT_COST = 12;

export const PASSWORD_MIN = 10;
export const PASSWORD_MAX = 72; // bcrypt reads only the first 72 bytes

/** Every bcrypt hash and comparison takes a turn at the process's gate (lib/auth/password-gate.ts); may throw PasswordChecksBusyError. */
export function hashPassword(password: string): Promise<string> {
  return passwordGate().run(() => bcrypt.hash(password, BCRYPT_COST));
}

let dummyHash: Promise<string> | undefined;

/**
 * Compares a password with a stored hash. With no hash (no such account) it still compares against a
 * throwaway hash of the same cost, so an unknown address takes as long as a wrong password.
 */
export async function verifyPassword(password: string, hash: string | null): Promise<boolean> {
  if (hash) return passwordGate().run(() => bcrypt.compare(password, hash));
  dummyHash ??= bcrypt.hash("spanlark-no-such-account", BCRYPT_COST);
  const dummy = await dummyHash;
  await passwordGate().run(() => bcrypt.compare(password, dummy));
  return false;
}

export function hashCost(hash: string): number {
  return bcrypt.getRounds(hash);
}
