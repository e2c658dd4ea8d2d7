import { HttpError } from "@/lib/http";
import { ROLES, type Role } from "./role-list";

export { ROLES, type Role };

/** The signed-in account as every route and action sees it; the role is read fresh per request. */
export interface SessionUser {
  id: string;
  email: string;
  name: string;
  company: string | null;
  role: Role;
}

/** Every role an account can hold: "any signed-in account" in requireRole(...SIGNED_IN). */
export const SIGNED_IN: readonly Role[] = ROLES;

/** 401 without a session, 403 when the account's role is not among `roles` (no roles: any account). */
export function assertRole(user: SessionUser | null, roles: readonly Role[]): SessionUser {
  if (!user) throw new HttpError(401, "sign in to do this");
  if (roles.length > 0 && !roles.includes(user.role)) throw new HttpError(403, "your account cannot do this");
  return user;
}
