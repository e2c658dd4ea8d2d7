import { z } from "zod";
import { PASSWORD_MAX, PASSWORD_MIN } from "./password";
import { DEFAULT_RETURN_PATH, safeReturnPath } from "./return-path";

// The server's rules for every auth body; the forms in components/auth mirror them with yup.

const email = z
  .string({ error: "enter your e-mail address" })
  .trim()
  .min(1, "enter your e-mail address")
  .max(254, "an e-mail address has at most 254 characters")
  .email("enter an e-mail address like name@example.com")
  .transform((v) => v.toLowerCase());

const newPassword = z
  .string({ error: "choose a password" })
  .min(PASSWORD_MIN, `use at least ${PASSWORD_MIN} characters`)
  .refine((v) => new TextEncoder().encode(v).length <= PASSWORD_MAX, `use at most ${PASSWORD_MAX} characters`);

const token = z.string({ error: "the link is missing its code" }).trim().min(20, "the link is incomplete").max(200, "the link is not valid");

const name = z.string({ error: "enter your name" }).trim().min(1, "enter your name").max(120, "use at most 120 characters");

const company = z
  .string()
  .trim()
  .max(160, "use at most 160 characters")
  .optional()
  .nullable()
  .transform((v) => (v ? v : null));

/**
 * The page that sent someone to sign up (the sign-up page's ?callbackUrl=), carried through the confirmation
 * e-mail so they come back to it. Only a path on our own origin is kept (lib/auth/return-path.ts); anything
 * else, or nothing, is null: the mailed link then leads to the usual page.
 */
const returnTo = z
  .string()
  .max(2000, "the return page address is too long")
  .optional()
  .nullable()
  .transform((v) => {
    const path = safeReturnPath(v);
    return v && path !== DEFAULT_RETURN_PATH ? path : null;
  });

export const SignUpSchema = z.object({ email, password: newPassword, name, company, returnTo });
export type SignUpInput = z.infer<typeof SignUpSchema>;

export const SignInSchema = z.object({
  email,
  password: z.string({ error: "enter your password" }).min(1, "enter your password").max(200, "that password is too long"),
});

export const EmailOnlySchema = z.object({ email });

export const ResendVerificationSchema = z.object({ email, returnTo });

export const VerifySchema = z.object({ token });

export const ResetPasswordSchema = z.object({ token, password: newPassword });

export const ChangePasswordSchema = z.object({
  currentPassword: z.string({ error: "enter your current password" }).min(1, "enter your current password").max(200, "that password is too long"),
  newPassword,
});

export const ProfileSchema = z.object({ name, company });
export type ProfileInput = z.infer<typeof ProfileSchema>;

export const ChangeRoleSchema = z.object({
  userId: z.string({ error: "choose an account" }).uuid("that is not an account id"),
  role: z.enum(["builder", "admin"], { error: "an admin can make an account a builder or an admin; subscriptions come from payments" }),
});

export const UserSearchSchema = z.object({
  q: z.string().trim().max(100, "use at most 100 characters").optional().default(""),
  page: z.coerce.number().int("page is a whole number").min(1, "page starts at 1").max(10_000).optional().default(1),
});
