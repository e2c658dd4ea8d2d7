/** The roles an account can hold: one list for the model, the session, the admin screens and the access checks. Pure. */
export const ROLES = ["builder", "subscriber", "admin"] as const;
export type Role = (typeof ROLES)[number];
