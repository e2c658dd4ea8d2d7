import { Op, UniqueConstraintError } from "sequelize";
import { getSequelize } from "@/lib/db";
import { env } from "@/lib/env";
import { HttpError } from "@/lib/http";
import { sendMail } from "@/lib/mail";
import { accountExistsMail } from "@/lib/mail/templates/account-exists";
import { resetNoAccountMail } from "@/lib/mail/templates/reset-no-account";
import { resetPasswordMail } from "@/lib/mail/templates/reset-password";
import { verifyEmailMail } from "@/lib/mail/templates/verify-email";
import { User, type Role } from "@/models/user";
import { atLeast, runInBackground } from "./background";
import { normalizeEmail, sha256Hex } from "./crypto";
import { hashPassword, verifyPassword } from "./password";
import { PASSWORD_BUSY_RETRY_SECONDS, PasswordChecksBusyError } from "./password-gate";
import { hit, hitAll, refund, type Limit, type LimitResult } from "./rate-limit";
import type { SessionUser } from "./roles";
import type { ProfileInput, SignUpInput } from "./schemas";
import { consumeToken, issueToken, TOKEN_LIFETIME_MS } from "./tokens";

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;

/** The limits, per e-mail address and per client address. Exported for the tests and the docs. */
export const LIMITS = {
  signInPerEmail: { max: 10, windowMs: 15 * MINUTE },
  signInPerIp: { max: 50, windowMs: 15 * MINUTE },
  resetPerEmail: { max: 5, windowMs: HOUR },
  resetPerIp: { max: 20, windowMs: HOUR },
  signUpPerEmail: { max: 5, windowMs: HOUR },
  signUpPerIp: { max: 20, windowMs: HOUR },
  /**
   * Once an address is over signInPerEmail, its password is still checked, slowly: once per client address per
   * 2 minutes, and at most 30 times in 15 minutes for the address from all clients together. The owner, who
   * tries from their own device, gets in with the right password; a guesser gets 40 guesses in 15 minutes, not
   * unlimited ones.
   */
  signInLockedPerClient: { max: 1, windowMs: 2 * MINUTE },
  signInLockedPerEmail: { max: 30, windowMs: 15 * MINUTE },
} as const;

/** The public flows answer no sooner than this, whatever they found. */
export const PUBLIC_FLOW_MIN_MS = 400;

function emailKey(kind: string, email: string): string {
  return `${kind}:email:${sha256Hex(normalizeEmail(email)).slice(0, 40)}`;
}

/** The two counters one attempt of `kind` bumps: one for the e-mail address, one for the client address. */
export function limitsFor(kind: "sign-in" | "reset" | "sign-up", email: string, ip: string): Limit[] {
  const [perEmail, perIp] =
    kind === "sign-in"
      ? [LIMITS.signInPerEmail, LIMITS.signInPerIp]
      : kind === "reset"
        ? [LIMITS.resetPerEmail, LIMITS.resetPerIp]
        : [LIMITS.signUpPerEmail, LIMITS.signUpPerIp];
  return [
    { key: emailKey(kind, email), ...perEmail },
    { key: `${kind}:ip:${ip}`, ...perIp },
  ];
}

export class RateLimitedError extends HttpError {
  constructor(readonly retryAfterSeconds: number) {
    const minutes = Math.ceil(retryAfterSeconds / 60);
    super(429, `too many tries; wait ${minutes} minute${minutes === 1 ? "" : "s"} and try again`, { retryAfterSeconds });
  }
}

function throwIfBlocked(result: LimitResult): void {
  if (!result.allowed) throw new RateLimitedError(result.retryAfterSeconds);
}

function link(path: string, params: Record<string, string> = {}): string {
  const url = new URL(path, env().APP_URL);
  for (const [k, v] of Object.entries(params)) url.searchParams.set(k, v);
  return url.toString();
}

export function toSessionUser(user: User): SessionUser {
  return { id: user.id, email: user.email, name: user.name, company: user.company, role: user.role };
}

async function findByEmail(email: string): Promise<User | null> {
  getSequelize();
  return User.findOne({ where: { email: normalizeEmail(email) } });
}

/** The confirmation link; `returnTo` (a safe path, lib/auth/schemas.ts) is where the confirmed builder carries on. */
async function mailVerification(user: User, returnTo: string | null = null): Promise<void> {
  const token = await issueToken(user.id, "verify-email");
  const hours = TOKEN_LIFETIME_MS["verify-email"] / HOUR;
  const params: Record<string, string> = returnTo ? { token, next: returnTo } : { token };
  await sendMail({ to: user.email, ...verifyEmailMail({ name: user.name, link: link("/verify", params), validHours: hours }) });
}

/**
 * Opens a builder account and mails a confirmation link. An address that already has an account gets a
 * mail saying so instead; the caller answers the same way in both cases.
 */
export async function signUp(input: Omit<SignUpInput, "returnTo"> & { returnTo?: string | null }, ip: string): Promise<void> {
  await atLeast(PUBLIC_FLOW_MIN_MS, async () => {
    throwIfBlocked(await hitAll(limitsFor("sign-up", input.email, ip)));
    const passwordHash = await hashPassword(input.password);
    const existing = await findByEmail(input.email);
    if (existing) {
      runInBackground("mail account-exists", () =>
        sendMail({
          to: existing.email,
          ...accountExistsMail({ name: existing.name, signInLink: link("/sign-in"), resetLink: link("/forgot-password") }),
        }),
      );
      return;
    }
    try {
      const user = await User.create({
        email: normalizeEmail(input.email),
        passwordHash,
        name: input.name,
        company: input.company,
        role: "builder",
        emailVerifiedAt: null,
      });
      runInBackground("mail verify-email", () => mailVerification(user, input.returnTo ?? null));
    } catch (err) {
      // Two sign-ups with one address at the same moment: the second is an existing account.
      if (!(err instanceof UniqueConstraintError)) throw err;
    }
  });
}

/** Mails a fresh confirmation link to an unconfirmed account; answers the same for any address. */
export async function resendVerification(email: string, ip: string, returnTo: string | null = null): Promise<void> {
  await atLeast(PUBLIC_FLOW_MIN_MS, async () => {
    throwIfBlocked(await hitAll(limitsFor("sign-up", email, ip)));
    const user = await findByEmail(email);
    if (user && !user.emailVerifiedAt) runInBackground("mail verify-email", () => mailVerification(user, returnTo));
  });
}

/** Confirms an address with a mailed token; false when the link is unknown, used or expired. */
export async function verifyEmail(token: string): Promise<boolean> {
  return (await verifyEmailOf(token)) !== null;
}

/** verifyEmail, answering with the account's id (to sign that browser in), or null. */
export async function verifyEmailOf(token: string): Promise<string | null> {
  getSequelize();
  const userId = await consumeToken(token, "verify-email");
  if (!userId) return null;
  await User.update({ emailVerifiedAt: new Date() }, { where: { id: userId, emailVerifiedAt: { [Op.is]: null } } });
  return userId;
}

/** Mails a new-password link (or, for an address with no account, a note saying so); same answer either way. */
export async function requestPasswordReset(email: string, ip: string): Promise<void> {
  await atLeast(PUBLIC_FLOW_MIN_MS, async () => {
    throwIfBlocked(await hitAll(limitsFor("reset", email, ip)));
    const user = await findByEmail(email);
    if (user) {
      const token = await issueToken(user.id, "reset-password");
      const minutes = TOKEN_LIFETIME_MS["reset-password"] / MINUTE;
      runInBackground("mail reset-password", () =>
        sendMail({
          to: user.email,
          ...resetPasswordMail({ name: user.name, link: link("/reset-password", { token }), validMinutes: minutes }),
        }),
      );
    } else {
      const to = normalizeEmail(email);
      runInBackground("mail reset-no-account", () => sendMail({ to, ...resetNoAccountMail({ signUpLink: link("/sign-up") }) }));
    }
  });
}

/**
 * Sets a new password with a mailed token. The password-changed time moves on, so sessions signed in
 * before it (a stolen phone, a shared computer) stop working. The mail reached its owner, so the address
 * counts as confirmed too. False when the link is unknown, used or expired.
 */
export async function resetPassword(token: string, password: string): Promise<boolean> {
  return (await resetPasswordOf(token, password)) !== null;
}

/** resetPassword, answering with the account's id (to sign that browser in), or null. */
export async function resetPasswordOf(token: string, password: string): Promise<string | null> {
  getSequelize();
  const passwordHash = await hashPassword(password);
  const userId = await consumeToken(token, "reset-password");
  if (!userId) return null;
  const user = await User.findByPk(userId);
  if (!user) return null;
  const now = new Date();
  await user.update({ passwordHash, passwordChangedAt: now, emailVerifiedAt: user.emailVerifiedAt ?? now });
  return user.id;
}

/** The account a sign-in ticket names, when it exists and is confirmed; null otherwise. */
export async function accountForTicket(userId: string): Promise<SessionUser | null> {
  getSequelize();
  const user = await User.findByPk(userId);
  if (!user || !user.emailVerifiedAt) return null;
  return toSessionUser(user);
}

export type SignInResult =
  { ok: true; user: SessionUser } | { ok: false; reason: "invalid" | "unverified" } | { ok: false; reason: "rate-limited" | "busy"; retryAfterSeconds: number };

/**
 * Checks an address and password. Unknown address and wrong password give the same answer in about the
 * same time (a bcrypt comparison either way). An unconfirmed account is told so only with the right password.
 */
export async function authenticate(email: string, password: string, ip: string): Promise<SignInResult> {
  const limits = limitsFor("sign-in", email, ip);
  const [perEmail, perIp] = await Promise.all(limits.map((l) => hit(l)));
  // The client's own limit always holds. The address's limit does not lock its owner out: past it, each client
  // gets one slow check (LIMITS.signInLocked*), so the right password still gets in.
  if (!perIp!.allowed) return { ok: false, reason: "rate-limited", retryAfterSeconds: perIp!.retryAfterSeconds };
  const slowLimits: Limit[] = [];
  if (!perEmail!.allowed) {
    slowLimits.push(
      { key: `${emailKey("sign-in-locked", email)}:ip:${ip}`, ...LIMITS.signInLockedPerClient },
      { key: emailKey("sign-in-locked", email), ...LIMITS.signInLockedPerEmail },
    );
    const slow = await hitAll(slowLimits);
    if (!slow.allowed) return { ok: false, reason: "rate-limited", retryAfterSeconds: slow.retryAfterSeconds };
  }
  const user = await findByEmail(email);
  let match: boolean;
  try {
    match = await verifyPassword(password, user?.passwordHash ?? null);
  } catch (err) {
    // The process is at its bound of password checks (lib/auth/password-gate.ts): nothing was checked, so the
    // try is given back on every counter, and the owner's next try, seconds later, is as good as this one.
    if (!(err instanceof PasswordChecksBusyError)) throw err;
    await refund([...limits, ...slowLimits]);
    return { ok: false, reason: "busy", retryAfterSeconds: PASSWORD_BUSY_RETRY_SECONDS };
  }
  if (!user || !match) return { ok: false, reason: "invalid" };
  // Counted first (atomically, so a burst cannot slip past), given back when the password was right.
  await refund(limits);
  if (!user.emailVerifiedAt) return { ok: false, reason: "unverified" };
  return { ok: true, user: toSessionUser(user) };
}

/**
 * A signed-in account changes its password, giving the current one. Wrong tries count against the same
 * limits as sign-in. Every session, this one included, ends: the person signs in again with the new one.
 */
export async function changePassword(userId: string, currentPassword: string, newPassword: string, ip: string): Promise<"changed" | "wrong-password"> {
  getSequelize();
  const user = await User.findByPk(userId);
  if (!user) throw new HttpError(404, "account not found");
  const result = await authenticate(user.email, currentPassword, ip);
  if (!result.ok && result.reason === "rate-limited") throw new RateLimitedError(result.retryAfterSeconds);
  if (!result.ok && result.reason === "busy") throw new PasswordChecksBusyError();
  if (!result.ok && result.reason === "invalid") return "wrong-password";
  await user.update({ passwordHash: await hashPassword(newPassword), passwordChangedAt: new Date() });
  return "changed";
}

export async function updateProfile(userId: string, input: ProfileInput): Promise<SessionUser> {
  getSequelize();
  const user = await User.findByPk(userId);
  if (!user) throw new HttpError(404, "account not found");
  await user.update({ name: input.name, company: input.company });
  return toSessionUser(user);
}

export interface UserListItem extends SessionUser {
  emailVerified: boolean;
  createdAt: Date;
}

export const USERS_PAGE_SIZE = 25;

/** Accounts for the admin list, newest first, searched by e-mail, name or company. */
export async function listUsers({ q, page }: { q: string; page: number }): Promise<{ users: UserListItem[]; total: number }> {
  getSequelize();
  const pattern = `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
  const where = q ? { [Op.or]: [{ email: { [Op.iLike]: pattern } }, { name: { [Op.iLike]: pattern } }, { company: { [Op.iLike]: pattern } }] } : {};
  const { rows, count } = await User.findAndCountAll({
    where,
    order: [
      ["createdAt", "DESC"],
      ["email", "ASC"],
    ],
    limit: USERS_PAGE_SIZE,
    offset: (page - 1) * USERS_PAGE_SIZE,
  });
  return {
    users: rows.map((u) => ({ ...toSessionUser(u), emailVerified: Boolean(u.emailVerifiedAt), createdAt: u.createdAt })),
    total: count,
  };
}

/**
 * An admin makes an account an admin or takes the admin role away (it becomes a builder). Subscriber is
 * the payment flow's alone: a subscriber's role is not changed here. No admin can remove their own role,
 * so the last admin cannot lock everyone out.
 */
export async function changeRole(actor: SessionUser, userId: string, role: Extract<Role, "builder" | "admin">): Promise<SessionUser> {
  if (actor.role !== "admin") throw new HttpError(403, "only an admin can change roles");
  if (actor.id === userId) throw new HttpError(409, "you cannot change your own role; ask another admin");
  getSequelize();
  const user = await User.findByPk(userId);
  if (!user) throw new HttpError(404, "account not found");
  if (user.role === "subscriber") throw new HttpError(409, "a subscriber's role follows their payments; it cannot be changed here");
  if (user.role !== role) await user.update({ role });
  return toSessionUser(user);
}
