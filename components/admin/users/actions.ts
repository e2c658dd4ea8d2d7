"use server";

import { revalidatePath } from "next/cache";
import { authorizeAction, type ActionDenied } from "@/lib/auth/action";
import { changeRole } from "@/lib/auth/accounts";
import { ChangeRoleSchema } from "@/lib/auth/schemas";
import { HttpError, zodIssues, type FieldIssue } from "@/lib/http";
import type { Role } from "@/lib/auth/role-list";

export type ChangeRoleResult = { ok: true; userId: string; role: Role } | { ok: false; error: string; issues?: FieldIssue[] } | ActionDenied;

// Makes an account an admin or a builder again; admins only, never their own role, never a subscriber's
export async function changeUserRole(input: unknown): Promise<ChangeRoleResult> {
  const auth = await authorizeAction("admin");
  if (!auth.ok) return auth;
  const parsed = ChangeRoleSchema.safeParse(input);
  if (!parsed.success) return { ok: false, error: "check the fields marked", issues: zodIssues(parsed.error) };
  try {
    const user = await changeRole(auth.user, parsed.data.userId, parsed.data.role);
    revalidatePath("/admin/users");
    return { ok: true, userId: user.id, role: user.role };
  } catch (err) {
    if (err instanceof HttpError) return { ok: false, error: err.message };
    throw err;
  }
}
