"use server";

import { revalidatePath } from "next/cache";
import { authorizeAction, type ActionDenied } from "@/lib/auth/action";
import { updateProfile as saveProfile } from "@/lib/auth/accounts";
import { ProfileSchema } from "@/lib/auth/schemas";
import { zodIssues, type FieldIssue } from "@/lib/http";

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
