"use server";

import { revalidatePath } from "next/cache";
import { headers } from "next/headers";
import { authorizeAction, type ActionDenied } from "@/lib/auth/action";
import { changePassword as savePassword, updateProfile as saveProfile } from "@/lib/auth/accounts";
import { clientIp } from "@/lib/auth/client-ip";
import { ChangePasswordSchema, ProfileSchema } from "@/lib/auth/schemas";
import { HttpError, zodIssues, type FieldIssue } from "@/lib/http";

export type ProfileResult = { ok: true; name: string; company: string | null } | { ok: false; error: string; issues?: FieldIssue[] } | ActionDenied;

// Saves the signed-in account's own name and company; any signed-in account
export async function updateProfile(input: unknown): Promise<ProfileResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = ProfileSchema.safeParse(input);
  if (!parsed.success) return { ok: false, error: "check the fields marked", issues: zodIssues(parsed.error) };
  const user = await saveProfile(auth.user.id, parsed.data);
  revalidatePath("/account");
  return { ok: true, name: user.name, company: user.company };
}

export type ChangePasswordResult = { ok: true } | { ok: false; error: string; issues?: FieldIssue[] } | ActionDenied;

// Changes the signed-in account's own password, given the current one; any signed-in account
export async function changePassword(input: unknown): Promise<ChangePasswordResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = ChangePasswordSchema.safeParse(input);
  if (!parsed.success) return { ok: false, error: "check the fields marked", issues: zodIssues(parsed.error) };
  try {
    const outcome = await savePassword(auth.user.id, parsed.data.currentPassword, parsed.data.newPassword, clientIp(await headers()));
    if (outcome === "wrong-password") {
      return { ok: false, error: "the current password is not right", issues: [{ path: "currentPassword", message: "not your current password" }] };
    }
    return { ok: true };
  } catch (err) {
    if (err instanceof HttpError) return { ok: false, error: err.message };
    throw err;
  }
}
