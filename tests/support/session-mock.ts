import { assertRole, type Role, type SessionUser } from "@/lib/auth/roles";

// Stands in for @/lib/auth/session in tests that call routes and actions directly:
//   vi.mock("@/lib/auth/session", () => import("@/tests/support/session-mock"));
// then set `who.current` to the account the test acts as (null: signed out).

export const who: { current: SessionUser | null } = { current: null };

export const getSessionUser = async (): Promise<SessionUser | null> => who.current;
export const requireUser = async (): Promise<SessionUser> => assertRole(who.current, []);
export const requireRole = async (...roles: Role[]): Promise<SessionUser> => assertRole(who.current, roles);
