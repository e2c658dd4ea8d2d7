/**
 * zod schemas of the jobs' server actions: what a job and a saved member may hold. Each rejection
 * names its field and the reason.
 */
import { z } from "zod";
import { LOAD_STANDARDS } from "@/lib/solver/asce7/standard";
import { flowStateSchema } from "@/lib/flow/schema";
import { memberSchema } from "@/lib/solver/design/schema";
import { FOOTING_SHAPES } from "@/lib/solver/design/footing";
import { POST_SIZES } from "@/lib/solver/design/post";
import { SAWN_GRADES, SPECIES } from "@/lib/tables/types";

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

const feet = (label: string, max: number) =>
  z
    .number({ error: `${label} must be a number in ft` })
    .finite(`${label} must be a number in ft`)
    .min(0, `${label} must be 0 ft or more`)
    .max(max, `${label} must be at most ${max} ft`);

/** Where a member sits on the member carrying it (lib/jobs/load-path.ts). */
export const bearingSchema = z
  .object({
    supports: z
      .array(z.number().int("Bears at: a support's number").min(0, "Bears at: a support's number").max(19, "Bears at: a support's number"))
      .max(20)
      .optional(),
    fromFt: feet("Sits from", 200).optional(),
    toFt: feet("Sits to", 200).optional(),
    xFt: feet("Bears at", 200).optional(),
  })
  .strict()
  .refine((b) => b.fromFt === undefined || b.toFt === undefined || b.toFt > b.fromFt, { message: "Sits to: must be past where it starts", path: ["toFt"] });

export const postDesignSchema = z
  .object({
    type: z.literal("post"),
    size: z.enum(POST_SIZES, { error: `Post size must be one of ${POST_SIZES.join(", ")}` }),
    plies: z.number().int("Studs must be a whole number").min(1, "Studs must be 1 to 4").max(4, "Studs must be 1 to 4"),
    species: z.enum(SPECIES, { error: `Species must be one of ${SPECIES.join(", ")}` }),
    grade: z.enum(SAWN_GRADES, { error: `Grade must be one of ${SAWN_GRADES.join(", ")}` }),
    heightFt: z
      .number({ error: "Post height must be a number in ft" })
      .gt(0, "Post height must be more than 0 ft")
      .max(30, "Post height must be at most 30 ft"),
    wet: z.boolean(),
  })
  .strict()
  .superRefine((p, ctx) => {
    const studs = p.size === "2x4" || p.size === "2x6";
    if (studs && p.plies < 2) ctx.addIssue({ code: "custom", path: ["plies"], message: "Studs: a stud column takes 2 to 4 studs" });
    if (!studs && p.plies !== 1) ctx.addIssue({ code: "custom", path: ["plies"], message: "Studs: a solid post is 1 piece" });
  });

export const footingDesignSchema = z
  .object({
    type: z.literal("footing"),
    shape: z.enum(FOOTING_SHAPES, { error: "Shape must be round or square" }),
    sizeIn: z.number({ error: "Size must be a number in in" }).min(6, "Size must be at least 6 in").max(120, "Size must be at most 120 in").nullable(),
    thicknessIn: z
      .number({ error: "Thickness must be a number in in" })
      .min(6, "Thickness must be at least 6 in (IRC 2021 R403.1.1)")
      .max(48, "Thickness must be at most 48 in"),
    soilPsf: z
      .number({ error: "Soil bearing must be a number in psf" })
      .min(500, "Soil bearing must be at least 500 psf")
      .max(12000, "Soil bearing must be at most 12,000 psf"),
    frostDepthIn: z
      .number({ error: "Frost depth must be a number in in" })
      .min(0, "Frost depth must be 0 in or more")
      .max(120, "Frost depth must be at most 120 in"),
    bottomDepthIn: z.number({ error: "Depth must be a number in in" }).min(0, "Depth must be 0 in or more").max(240, "Depth must be at most 240 in").nullable(),
  })
  .strict();

export const supportDesignSchema = z.discriminatedUnion("type", [postDesignSchema, footingDesignSchema], { error: 'Kind must be "post" or "footing"' });

/** Add posts under a member (one under each of its supports) or footings under posts. */
export const addSupportSchema = z
  .object({
    jobId: uuid("Job"),
    /** the member the new posts or footings go under */
    underMemberId: uuid("Under"),
    label: z.string().trim().min(1, "Name is required, e.g. P1 deck posts").max(120, "Name must be 120 characters or fewer"),
    design: supportDesignSchema,
  })
  .strict();
export type AddSupportInput = z.infer<typeof addSupportSchema>;

/** Delete a member; one that carries others says what happens to them: they stay (on nothing) or go too. */
export const deleteMemberSchema = z.object({
  memberId: uuid("Member"),
  carried: z.enum(["keep", "delete"], { error: 'Members on it: must be "keep" or "delete"' }).optional(),
});

export const updateMemberSchema = z.object({
  memberId: uuid("Member"),
  label: label.optional(),
  flowState: z.optional(flowStateSchema),
  chosenMember: memberSchema.nullable().optional(),
  /** the member that carries this one (joists on a beam), in the same job; null to clear */
  carriedByMemberId: uuid("Carried by").nullable().optional(),
  /** where it sits on that member; null clears */
  bearing: bearingSchema.nullable().optional(),
  /** a post's or footing's inputs */
  supportDesign: supportDesignSchema.optional(),
  /** work the member out again on this load basis (the job page's one-tap re-check) */
  loadStandard: z.enum(LOAD_STANDARDS, { error: `Load basis: must be one of ${LOAD_STANDARDS.join(", ")}` }).optional(),
  ...orderDetailsFields,
});
export type UpdateMemberInput = z.infer<typeof updateMemberSchema>;

/**
 * A change to a saved member made on a phone with no signal (PATCH /api/members/[memberId]), sent later: its
 * name, inputs and chosen member, and the version of the member the phone changed (applied only if the member
 * is still that version).
 */
export const editMemberSchema = z.object({
  /** the member's version when the phone opened it (lib/jobs/edit-once.ts#memberVersion) */
  baseVersion: z.string().regex(/^[0-9a-f]{64}$/, "Base version: send the version the member had when this phone opened it"),
  label,
  flowState: flowStateSchema,
  chosenMember: memberSchema.nullable().default(null),
  /** the account the change was made in (a change queued on a phone is refused when another account sends it) */
  accountId: uuid("Account").optional(),
});
export type EditMemberInput = z.infer<typeof editMemberSchema>;
