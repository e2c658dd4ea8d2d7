/**
 * zod schemas of the jobs' server actions: what a job and a saved member may hold. Each rejection
 * names its field and the reason.
 */
import { z } from "zod";
import { LOAD_STANDARDS } from "@/lib/solver/asce7/standard";
import { flowStateSchema } from "@/lib/flow/schema";
import { memberSchema } from "@/lib/solver/design/schema";

export const uuid = (what: string) => z.string().uuid(`${what} is not a valid id`);

export const jobInputSchema = z.object({
  name: z.string().trim().min(1, "Job name is required").max(120, "Job name must be 120 characters or fewer"),
  siteAddress: z.string().trim().max(240, "Site address must be 240 characters or fewer").default(""),
  notes: z.string().trim().max(4000, "Notes must be 4,000 characters or fewer").default(""),
});
export type JobInput = z.infer<typeof jobInputSchema>;

export const updateJobSchema = jobInputSchema.extend({ jobId: uuid("Job") });
export const jobIdSchema = z.object({ jobId: uuid("Job") });
export const memberIdSchema = z.object({ memberId: uuid("Member") });

const label = z.string().trim().min(1, "Member name is required, e.g. H1 kitchen header").max(120, "Member name must be 120 characters or fewer");

/** Save the flow's answer: to an existing job, or to a new one made on the spot. */
export const saveMemberSchema = z
  .object({
    jobId: uuid("Job").optional(),
    newJob: jobInputSchema.optional(),
    label,
    flowState: flowStateSchema,
    /** the member chosen on the answer screen; without one the best that passes is saved */
    chosenMember: memberSchema.nullable().default(null),
    /** makes the save idempotent: sent again with the same key, it answers as the first time and makes no second member */
    saveKey: uuid("Save key").optional(),
    /** the account the save was made in (a save queued on a phone is refused when another account sends it) */
    accountId: uuid("Account").optional(),
  })
  .superRefine((v, ctx) => {
    if ((v.jobId === undefined) === (v.newJob === undefined)) {
      ctx.addIssue({ code: "custom", path: ["jobId"], message: "Job: pick a job or give a new job's name, not both" });
    }
  });
export type SaveMemberInput = z.infer<typeof saveMemberSchema>;

const measure = (label: string, unit: string, min: number, max: number) =>
  z
    .number({ error: `${label} must be a number in ${unit}` })
    .finite(`${label} must be a number in ${unit}`)
    .min(min, `${label} must be at least ${min} ${unit}`)
    .max(max, `${label} must be at most ${max} ${unit}`)
    .nullable()
    .optional();

/** What the order list needs of a member beyond its sizing; null clears a value. */
export const orderDetailsFields = {
  /** width of floor, deck or roof the joists or rafters repeat across */
  runWidthFt: measure("Width", "ft", 1, 200),
  postHeightFt: measure("Post height", "ft", 1, 30),
  postSize: z.enum(["4x4", "4x6", "6x6", "8x8"], { error: "Post size must be 4x4, 4x6, 6x6 or 8x8" }).nullable().optional(),
  footingDiameterIn: measure("Footing diameter", "in", 6, 60),
  footingDepthIn: measure("Footing depth", "in", 6, 120),
};

export const updateMemberSchema = z.object({
  memberId: uuid("Member"),
  label: label.optional(),
  flowState: flowStateSchema.optional(),
  chosenMember: memberSchema.nullable().optional(),
  /** the member that carries this one (joists on a beam), in the same job; null to clear */
  carriedByMemberId: uuid("Carried by").nullable().optional(),
  /** work the member out again on this load basis (the job page's one-tap re-check) */
  loadStandard: z.enum(LOAD_STANDARDS, { error: `Load basis: must be one of ${LOAD_STANDARDS.join(", ")}` }).optional(),
  ...orderDetailsFields,
});
export type UpdateMemberInput = z.infer<typeof updateMemberSchema>;
