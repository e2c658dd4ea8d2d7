"use server";

import { runAction, type ActionResult } from "@/lib/auth/action";
import { changeRole } from "@/lib/auth/accounts";
import { ChangeRoleSchema } from "@/lib/auth/schemas";
import type { Role } from "@/lib/auth/role-list";

export type ChangeRoleResult = ActionResult<{ userId: string; role: Role }>;

// Makes an account an admin or a builder again; admins only, never their own role, never a subscriber's
export async function changeUserRole(input: unknown): Promise<ChangeRoleResult> {
  return runAction(input, {
    roles: ["admin"],
    schema: ChangeRoleSchema,
    invalid: "check the fields marked",
    failed: "The role could not be changed.",
    run: async (admin, data) => {
      const user = await changeRole(admin, data.userId, data.role);
      return { userId: user.id, role: user.role };
    },
    refresh: () => ["/admin/users"],
  });
}
