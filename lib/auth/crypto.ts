import { createHash, randomBytes } from "node:crypto";

/** Hex SHA-256; used for stored token hashes and for rate-limit keys that must not hold an address. */
export function sha256Hex(value: string): string {
  return createHash("sha256").update(value).digest("hex");
}

/** 32 random bytes as URL-safe text: the secret mailed in a link. */
export function newTokenSecret(): string {
  return randomBytes(32).toString("base64url");
}

/** Addresses are kept and compared trimmed and lower-cased. */
export function normalizeEmail(email: string): string {
  return email.trim().toLowerCase();
}
