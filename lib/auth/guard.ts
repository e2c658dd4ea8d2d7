import "server-only";
import { redirect } from "next/navigation";
import type { SessionUser } from "./roles";
import { getSessionUser } from "./session";

/** For pages: the signed-in account, or a redirect to sign-in that comes back to `returnTo`. */
export async function userForPage(returnTo: string): Promise<SessionUser> {
  const user = await getSessionUser();
  if (!user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(returnTo)}`);
  return user;
}

/** For admin pages: the account when it is an admin, null when it is signed in with another role. */
export async function adminForPage(returnTo: string): Promise<SessionUser | null> {
  const user = await userForPage(returnTo);
  return user.role === "admin" ? user : null;
}
