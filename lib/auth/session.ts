import "server-only";
import { getServerSession } from "next-auth";
import { cache } from "react";
import { getSequelize } from "@/lib/db";
import { User } from "@/models/user";
import { toSessionUser } from "./accounts";
import { authOptions } from "./options";
import { assertRole, type Role, type SessionUser } from "./roles";

export type { Role, SessionUser };

/**
 * The signed-in account, or null. The session cookie holds only the account id; the role, name and company
 * are read from the database on every request, so a role change applies at once. A session signed in
 * before the password last changed no longer counts.
 */
export const getSessionUser = cache(async (): Promise<SessionUser | null> => {
  const session = await getServerSession(authOptions());
  const id = session?.user?.id;
  if (!id) return null;
  getSequelize();
  const user = await User.findByPk(id);
  if (!user) return null;
  if (user.passwordChangedAt && session.authAt < user.passwordChangedAt.getTime()) return null;
  return toSessionUser(user);
});

/** The signed-in account; throws HttpError 401 when there is none. */
export async function requireUser(): Promise<SessionUser> {
  return assertRole(await getSessionUser(), []);
}

/** The signed-in account when its role is one of `roles`; HttpError 401 when signed out, 403 otherwise. */
export async function requireRole(...roles: Role[]): Promise<SessionUser> {
  return assertRole(await getSessionUser(), roles);
}
