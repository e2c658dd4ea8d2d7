import { Op, QueryTypes } from "sequelize";
import { getSequelize } from "@/lib/db";
import { AuthToken, type AuthTokenPurpose } from "@/models/auth-token";
import { newTokenSecret, sha256Hex } from "./crypto";

/** How long a mailed link works. */
export const TOKEN_LIFETIME_MS: Record<AuthTokenPurpose, number> = {
  "verify-email": 48 * 60 * 60 * 1000,
  "reset-password": 60 * 60 * 1000,
};

/**
 * Makes a token for a user and returns the secret to mail (never stored). Earlier tokens of the same
 * purpose are deleted, so only the newest link works; the user's spent and expired ones go too.
 */
export async function issueToken(userId: string, purpose: AuthTokenPurpose, now: Date = new Date()): Promise<string> {
  getSequelize();
  const secret = newTokenSecret();
  await AuthToken.destroy({
    where: { userId, [Op.or]: [{ purpose }, { usedAt: { [Op.not]: null } }, { expiresAt: { [Op.lte]: now } }] },
  });
  await AuthToken.create({
    userId,
    purpose,
    tokenHash: sha256Hex(secret),
    expiresAt: new Date(now.getTime() + TOKEN_LIFETIME_MS[purpose]),
    usedAt: null,
  });
  return secret;
}

/**
 * Spends a token: one atomic UPDATE marks it used only if it exists, has this purpose, is unused and has not
 * expired, so two requests racing with the same link cannot both succeed. Returns the user's id or null.
 */
export async function consumeToken(secret: string, purpose: AuthTokenPurpose, now: Date = new Date()): Promise<string | null> {
  if (!secret || secret.length > 200) return null;
  const rows = await getSequelize().query<{ user_id: string }>(
    `UPDATE auth_tokens SET used_at = :now, updated_at = :now
      WHERE token_hash = :hash AND purpose = :purpose AND used_at IS NULL AND expires_at > :now
      RETURNING user_id`,
    { replacements: { now, hash: sha256Hex(secret), purpose }, type: QueryTypes.SELECT },
  );
  return rows[0]?.user_id ?? null;
}
