import { z } from "zod";

/** How long a new crew link lasts; 0 = until revoked. */
export const CREW_LINK_EXPIRY_DAYS = [0, 1, 7, 30, 90] as const;
export type CrewLinkExpiryDays = (typeof CREW_LINK_EXPIRY_DAYS)[number];

const uuid = z.string().uuid("must be a job or link id");

export const createCrewLinkSchema = z.object({
  jobId: uuid,
  label: z.string().trim().max(80, "must be 80 characters or fewer").optional().default(""),
  expiresInDays: z.coerce.number().refine((d): d is CrewLinkExpiryDays => (CREW_LINK_EXPIRY_DAYS as readonly number[]).includes(d), {
    message: "must be 0 (no expiry), 1, 7, 30 or 90 days",
  }),
});
export type CreateCrewLinkInput = z.infer<typeof createCrewLinkSchema>;

export const crewLinkIdSchema = z.object({ linkId: uuid });

export const sendCrewLinkSchema = z.object({
  linkId: uuid,
  to: z.string().trim().toLowerCase().email("must be an e-mail address").max(254, "must be 254 characters or fewer"),
  note: z.string().trim().max(500, "must be 500 characters or fewer").optional().default(""),
});
export type SendCrewLinkInput = z.infer<typeof sendCrewLinkSchema>;
