import "server-only";
import { forbidden, redirect } from "next/navigation";
import type { SessionUser } from "./roles";
import { getSessionUser } from "./session";

/** For pages: the signed-in account, or a redirect to sign-in that comes back to `returnTo`. */
export async function userForPage(returnTo: string): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(returnTo)}`);
  return user;
}

/**
 * For admin pages: the account when it is an admin. Signed in with another role, the page answers 403 with
 * app/forbidden.tsx (Next's forbidden(); experimental.authInterrupts in next.config.mjs).
 */
export async function adminForPage(returnTo: string): Promise<SessionUser> {
  const user = await userForPage(returnTo);
  if (user.role !== "admin") forbidden();
  return user;
}
