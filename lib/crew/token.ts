import { createCipheriv, createDecipheriv, createHash, hkdfSync, randomBytes, timingSafeEqual } from "node:crypto";

/**
 * Crew link tokens.
 *
 * A token is 32 bytes (256 bits) from crypto.randomBytes, written as 43 URL-safe base64 characters. The
 * database keeps two things:
 * - `tokenHash`, the SHA-256 of the token, the only column a signed-out visitor's lookup reads;
 * - `tokenSealed`, the token encrypted with AES-256-GCM under a key derived (HKDF-SHA256) from
 *   NEXTAUTH_SECRET, read only by the owner's queries so the owner can copy the link again later.
 * A copy of the database alone (a backup, a leaked dump) therefore opens no crew link: the hash cannot be
 * turned back into a token and the sealed copy needs the server's secret. If that secret is rotated, old
 * links keep working (lookup is by hash) but cannot be shown again; the owner makes a new one.
 */

export const CREW_TOKEN_BYTES = 32;
/** base64url of 32 bytes, no padding */
export const CREW_TOKEN_LENGTH = 43;
const TOKEN_SHAPE = /^[A-Za-z0-9_-]{43}$/;

export function newCrewToken(): string {
  return randomBytes(CREW_TOKEN_BYTES).toString("base64url");
}

/** A string that could be a token (checked before any database lookup, so junk never reaches SQL). */
export function looksLikeCrewToken(value: string): boolean {
  return TOKEN_SHAPE.test(value);
}

export function hashCrewToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

/** Constant-time comparison of a token against a stored hash. */
export function tokenMatchesHash(token: string, hashHex: string): boolean {
  const a = Buffer.from(hashCrewToken(token), "hex");
  const b = Buffer.from(hashHex, "hex");
  return a.length === b.length && timingSafeEqual(a, b);
}

function sealingKey(secret: string): Buffer {
  return Buffer.from(hkdfSync("sha256", secret, "spanlark", "crew-link-token v1", 32));
}

/** "v1.<iv>.<tag>.<ciphertext>", each part base64url. */
export function sealCrewToken(token: string, secret: string): string {
  const iv = randomBytes(12);
  const cipher = createCipheriv("aes-256-gcm", sealingKey(secret), iv);
  const body = Buffer.concat([cipher.update(token, "utf8"), cipher.final()]);
  return ["v1", iv.toString("base64url"), cipher.getAuthTag().toString("base64url"), body.toString("base64url")].join(".");
}

/** The token back, or null when the secret has changed or the value was tampered with. */
export function openCrewToken(sealed: string, secret: string): string | null {
  const parts = sealed.split(".");
  if (parts.length !== 4 || parts[0] !== "v1") return null;
  try {
    const decipher = createDecipheriv("aes-256-gcm", sealingKey(secret), Buffer.from(parts[1], "base64url"));
    decipher.setAuthTag(Buffer.from(parts[2], "base64url"));
    const token = Buffer.concat([decipher.update(Buffer.from(parts[3], "base64url")), decipher.final()]).toString("utf8");
    return looksLikeCrewToken(token) ? token : null;
  } catch {
    return null;
  }
}

/** The page a crew member opens. */
export function crewLinkUrl(appUrl: string, token: string): string {
  return `${appUrl.replace(/\/$/, "")}/crew/${token}`;
}
