"use server";

import { headers } from "next/headers";
import { runAction, type ActionResult } from "@/lib/auth/action";
import { changePassword as savePassword, updateProfile as saveProfile } from "@/lib/auth/accounts";
import { clientIp } from "@/lib/auth/client-ip";
import { ChangePasswordSchema, ProfileSchema } from "@/lib/auth/schemas";
import { HttpError } from "@/lib/http";

export type ProfileResult = ActionResult<{ name: string; company: string | null }>;

// Saves the signed-in account's own name and company; any signed-in account
export async function updateProfile(input: unknown): Promise<ProfileResult> {
  return runAction(input, {
    schema: ProfileSchema,
    invalid: "check the fields marked",
    failed: "The profile could not be saved.",
    run: async (user, data) => {
      const saved = await saveProfile(user.id, data);
      return { name: saved.name, company: saved.company };
    },
    refresh: () => ["/account"],
  });
}

export type ChangePasswordResult = ActionResult<object>;

// Changes the signed-in account's own password, given the current one; any signed-in account
export async function changePassword(input: unknown): Promise<ChangePasswordResult> {
  return runAction(input, {
    schema: ChangePasswordSchema,
    invalid: "check the fields marked",
    failed: "The password could not be changed.",
    run: async (user, data) => {
      const outcome = await savePassword(user.id, data.currentPassword, data.newPassword, clientIp(await headers()));
      if (outcome === "wrong-password") {
        throw new HttpError(400, "the current password is not right", { issues: [{ path: "currentPassword", message: "not your current password" }] });
      }
      return {};
    },
  });
}
