import { createHmac, timingSafeEqual } from "node:crypto";

/**
 * A sign-in ticket: proof, for a couple of minutes, that the holder just spent a single-use mailed link (an
 * e-mail confirmation or a password reset) for one account, so the browser that opened the link is signed in
 * without typing the password again. It is handed back only in the answer to that link's POST, signed with
 * NEXTAUTH_SECRET (HMAC-SHA256), and names the account, its purpose and when it runs out:
 * "<userId>.<purpose>.<expiresMs>.<signature>".
 */

export type TicketPurpose = "verified" | "reset";

/** How long a ticket works: long enough for the next request, short enough not to matter if copied. */
export const TICKET_LIFETIME_MS = 2 * 60 * 1000;

function sign(body: string, secret: string): string {
  return createHmac("sha256", secret).update(`spanlark-sign-in-ticket:${body}`).digest("base64url");
}

export function issueSignInTicket(userId: string, purpose: TicketPurpose, secret: string, now: Date = new Date()): string {
  const body = `${userId}.${purpose}.${now.getTime() + TICKET_LIFETIME_MS}`;
  return `${body}.${sign(body, secret)}`;
}

/** The account a ticket names, or null when it is malformed, forged or out of date. */
export function readSignInTicket(ticket: string, secret: string, now: Date = new Date()): { userId: string; purpose: TicketPurpose } | null {
  if (typeof ticket !== "string" || ticket.length > 300) return null;
  const parts = ticket.split(".");
  if (parts.length !== 4) return null;
  const [userId, purpose, expires, signature] = parts;
  if (!/^[0-9a-f-]{36}$/i.test(userId) || (purpose !== "verified" && purpose !== "reset") || !/^\d{1,15}$/.test(expires)) return null;
  const expected = Buffer.from(sign(`${userId}.${purpose}.${expires}`, secret));
  const given = Buffer.from(signature);
  if (expected.length !== given.length || !timingSafeEqual(expected, given)) return null;
  if (Number(expires) <= now.getTime()) return null;
  return { userId, purpose };
}
