/**
 * zod schemas of the flow's state, for the server (saving a member) and for reading a state back
 * from the URL or local storage. Limits follow the solver's (200 ft, 20 supports, 200 loads).
 */
import { zodIssues, type FieldIssue } from "@/lib/zod-issues";
import * as z from "zod/mini";
import { EXPOSURE_CE, THERMAL_CT, type RoofExposure, type RoofThermal } from "@/lib/solver/asce7/snow";
import { LOAD_STANDARDS } from "@/lib/solver/asce7/standard";
import { MEMBER_KINDS, WALL_FRAMINGS } from "@/lib/solver/design/kinds";
import { LOAD_CASES, SUPPORT_TYPES } from "@/lib/solver/types";
import { SAWN_GRADES, SPECIES } from "@/lib/tables/types";
import { MATERIAL_FAMILIES, MAX_LENGTH_FT } from "./state";

const EXPOSURES = Object.keys(EXPOSURE_CE) as [RoofExposure, ...RoofExposure[]];
const THERMALS = Object.keys(THERMAL_CT) as [RoofThermal, ...RoofThermal[]];

export { MAX_LENGTH_FT };
// zod/mini (the same checks as zod's chained API, as functions): the browser reads a stored or linked state back
// with this schema, and the chunk that loads for it is 85 KB with zod/mini against 107 KB with zod (Turbopack build,
// 2026-12-04; README "Third pass")
const num = (...checks: z.core.$ZodCheck<number>[]) => z.number().check(...checks);
const position = num(z.minimum(0, "must be 0 or more"), z.maximum(MAX_LENGTH_FT, `must be ${MAX_LENGTH_FT} ft or less`));
const loadCase = z.enum(LOAD_CASES);
const label = z.string().check(z.trim(), z.maxLength(80, "must be 80 characters or fewer"));
const id = z.string().check(z.minLength(1), z.maxLength(40));

export const flowStateSchema = z
  .object({
    version: z.literal(1),
    kind: z.enum(MEMBER_KINDS),
    lengthFt: num(z.gt(0, "must be more than 0"), z.maximum(MAX_LENGTH_FT, `must be ${MAX_LENGTH_FT} ft or less`)),
    supports: z
      .array(z.object({ x: position, type: z.enum(SUPPORT_TYPES) }))
      .check(z.minLength(1, "needs at least one support"), z.maxLength(20, "can have at most 20 supports")),
    width: z.discriminatedUnion("mode", [
      z.object({ mode: z.literal("spacing"), spacingIn: num(z.gt(0, "must be more than 0"), z.maximum(96, "must be 96 in or less")) }),
      z.object({ mode: z.literal("tributary"), tributaryFt: num(z.gt(0, "must be more than 0"), z.maximum(60, "must be 60 ft or less")) }),
    ]),
    areaLoads: z
      .array(
        z.object({
          id,
          preset: z.string().check(z.maxLength(40)),
          label,
          case: loadCase,
          psf: num(z.minimum(0, "cannot be negative"), z.maximum(1000, "must be 1,000 psf or less")),
        }),
      )
      .check(z.maxLength(20)),
    snow: z.object({
      on: z.boolean(),
      groundPsf: num(z.minimum(0, "cannot be negative"), z.maximum(500, "must be 500 psf or less")),
      exposure: z.enum(EXPOSURES),
      thermal: z.enum(THERMALS),
    }),
    pointLoads: z
      .array(
        z.object({
          id,
          label,
          x: position,
          P: num(z.gt(0, "must be more than 0"), z.maximum(1_000_000, "must be 1,000,000 lb or less")),
          case: loadCase,
        }),
      )
      .check(z.maxLength(100)),
    lineLoads: z
      .array(
        z
          .object({
            id,
            label,
            from: position,
            to: position,
            w: num(z.gt(0, "must be more than 0"), z.maximum(100_000, "must be 100,000 plf or less")),
            case: loadCase,
          })
          .check(z.refine((l) => l.to > l.from, { message: "must end after it starts", path: ["to"] })),
      )
      .check(z.maxLength(100)),
    material: z.object({
      family: z.enum(MATERIAL_FAMILIES),
      species: z.enum(SPECIES),
      grade: z.enum(SAWN_GRADES),
      plies: z.int().check(z.minimum(0), z.maximum(4)),
      product: z.string().check(z.maxLength(80)),
    }),
    bearingIn: num(z.gt(0, "must be more than 0"), z.maximum(48, "must be 48 in or less")),
    limits: z.object({
      live: num(z.minimum(60, "must be L/60 or stiffer"), z.maximum(2000, "must be L/2000 or less")),
      total: num(z.minimum(60, "must be L/60 or stiffer"), z.maximum(2000, "must be L/2000 or less")),
    }),
    wet: z.boolean(),
    repetitive: z.boolean(),
    unbracedFt: num(z.minimum(0, "cannot be negative"), z.maximum(MAX_LENGTH_FT)),
    /** the bottom edge braced along its length (a ceiling fastened directly to it); absent in states saved before it was asked: no */
    bottomBraced: z.optional(z.boolean()),
    selfWeight: z.boolean(),
    loadStandard: z.optional(z.enum(LOAD_STANDARDS, { error: `must be one of ${LOAD_STANDARDS.join(", ")}` })),
    incised: z.optional(z.nullable(z.boolean())),
    wallFraming: z.optional(z.enum([...WALL_FRAMINGS, "none"], { error: `must be one of ${[...WALL_FRAMINGS, "none"].join(", ")}` })),
    roughOpeningFt: z.optional(z.nullable(num(z.gt(0, "must be more than 0"), z.maximum(MAX_LENGTH_FT, `must be ${MAX_LENGTH_FT} ft or less`)))),
  })
  .check(
    z.superRefine((s, ctx) => {
      s.supports.forEach((sup, i) => {
        if (sup.x > s.lengthFt + 1e-9) ctx.addIssue({ code: "custom", path: ["supports", i, "x"], message: "is past the end of the member" });
      });
      s.pointLoads.forEach((p, i) => {
        if (p.x > s.lengthFt + 1e-9) ctx.addIssue({ code: "custom", path: ["pointLoads", i, "x"], message: "is past the end of the member" });
      });
      s.lineLoads.forEach((l, i) => {
        if (l.to > s.lengthFt + 1e-9) ctx.addIssue({ code: "custom", path: ["lineLoads", i, "to"], message: "is past the end of the member" });
      });
    }),
  );

/** Everything the user has told the flow: the whole input of a member (URL, local storage, a saved member's flowState). */
export type FlowState = z.infer<typeof flowStateSchema>;

/** Reads a state that came from outside (URL, storage, a saved member); null when it does not fit. */
export function parseFlowState(value: unknown): FlowState | null {
  const parsed = flowStateSchema.safeParse(value);
  return parsed.success ? parsed.data : null;
}

/** Field-by-field problems of a state, as "field: reason" lines (for the flow's warning and the server's 400). */
export function flowStateIssues(value: unknown): FieldIssue[] {
  const parsed = flowStateSchema.safeParse(value);
  return parsed.success ? [] : zodIssues(parsed.error);
}
