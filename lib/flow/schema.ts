/**
 * zod schemas of the flow's state, for the server (saving a member) and for reading a state back
 * from the URL or local storage. Limits follow the solver's (200 ft, 20 supports, 200 loads).
 */
import { z } from "zod";
import { LOAD_CASES } from "@/lib/solver/types";
import { LOAD_STANDARDS } from "@/lib/solver/asce7/standard";
import { WALL_FRAMINGS } from "@/lib/solver/design/kinds";
import { MATERIAL_FAMILIES, MAX_LENGTH_FT, MEMBER_KINDS, type FlowState } from "./state";

const SPECIES = ["Douglas Fir-Larch", "Hem-Fir", "Spruce-Pine-Fir", "Southern Pine"] as const;
const GRADES = ["Select Structural", "No.1", "No.2", "No.3"] as const;

export { MAX_LENGTH_FT };
const position = z.number().min(0, "must be 0 or more").max(MAX_LENGTH_FT, `must be ${MAX_LENGTH_FT} ft or less`);
const loadCase = z.enum(LOAD_CASES as unknown as ["D", "L", "Lr", "S", "W"]);
const label = z.string().trim().max(80, "must be 80 characters or fewer");
const id = z.string().min(1).max(40);

export const flowStateSchema = z
  .object({
    version: z.literal(1),
    kind: z.enum(MEMBER_KINDS),
    lengthFt: z.number().gt(0, "must be more than 0").max(MAX_LENGTH_FT, `must be ${MAX_LENGTH_FT} ft or less`),
    supports: z
      .array(z.object({ x: position, type: z.enum(["pin", "roller", "fixed"]) }))
      .min(1, "needs at least one support")
      .max(20, "can have at most 20 supports"),
    width: z.discriminatedUnion("mode", [
      z.object({ mode: z.literal("spacing"), spacingIn: z.number().gt(0, "must be more than 0").max(96, "must be 96 in or less") }),
      z.object({ mode: z.literal("tributary"), tributaryFt: z.number().gt(0, "must be more than 0").max(60, "must be 60 ft or less") }),
    ]),
    areaLoads: z
      .array(z.object({ id, preset: z.string().max(40), label, case: loadCase, psf: z.number().min(0, "cannot be negative").max(1000, "must be 1,000 psf or less") }))
      .max(20),
    snow: z.object({
      on: z.boolean(),
      groundPsf: z.number().min(0, "cannot be negative").max(500, "must be 500 psf or less"),
      exposure: z.enum(["fully-exposed", "partially-exposed", "sheltered"]),
      thermal: z.enum(["heated", "cold-ventilated", "unheated"]),
    }),
    pointLoads: z
      .array(z.object({ id, label, x: position, P: z.number().gt(0, "must be more than 0").max(1_000_000, "must be 1,000,000 lb or less"), case: loadCase }))
      .max(100),
    lineLoads: z
      .array(
        z
          .object({ id, label, from: position, to: position, w: z.number().gt(0, "must be more than 0").max(100_000, "must be 100,000 plf or less"), case: loadCase })
          .refine((l) => l.to > l.from, { message: "must end after it starts", path: ["to"] }),
      )
      .max(100),
    material: z.object({
      family: z.enum(MATERIAL_FAMILIES),
      species: z.enum(SPECIES),
      grade: z.enum(GRADES),
      plies: z.number().int().min(0).max(4),
      product: z.string().max(80),
    }),
    bearingIn: z.number().gt(0, "must be more than 0").max(48, "must be 48 in or less"),
    limits: z.object({
      live: z.number().min(60, "must be L/60 or stiffer").max(2000, "must be L/2000 or less"),
      total: z.number().min(60, "must be L/60 or stiffer").max(2000, "must be L/2000 or less"),
    }),
    wet: z.boolean(),
    repetitive: z.boolean(),
    unbracedFt: z.number().min(0, "cannot be negative").max(MAX_LENGTH_FT),
    selfWeight: z.boolean(),
    loadStandard: z.enum(LOAD_STANDARDS, { error: `must be one of ${LOAD_STANDARDS.join(", ")}` }).optional(),
    incised: z.boolean().nullable().optional(),
    wallFraming: z.enum([...WALL_FRAMINGS, "none"], { error: `must be one of ${[...WALL_FRAMINGS, "none"].join(", ")}` }).optional(),
    roughOpeningFt: z.number().gt(0, "must be more than 0").max(MAX_LENGTH_FT, `must be ${MAX_LENGTH_FT} ft or less`).nullable().optional(),
  })
  .superRefine((s, ctx) => {
    s.supports.forEach((sup, i) => {
      if (sup.x > s.lengthFt + 1e-9) ctx.addIssue({ code: "custom", path: ["supports", i, "x"], message: "is past the end of the member" });
    });
    s.pointLoads.forEach((p, i) => {
      if (p.x > s.lengthFt + 1e-9) ctx.addIssue({ code: "custom", path: ["pointLoads", i, "x"], message: "is past the end of the member" });
    });
    s.lineLoads.forEach((l, i) => {
      if (l.to > s.lengthFt + 1e-9) ctx.addIssue({ code: "custom", path: ["lineLoads", i, "to"], message: "is past the end of the member" });
    });
  });

/** Reads a state that came from outside (URL, storage, a saved member); null when it does not fit. */
export function parseFlowState(value: unknown): FlowState | null {
  const parsed = flowStateSchema.safeParse(value);
  return parsed.success ? (parsed.data as FlowState) : null;
}

/** Field-by-field problems of a state, as "field: reason" lines (for the flow's warning and the server's 400). */
export function flowStateIssues(value: unknown): { path: string; message: string }[] {
  const parsed = flowStateSchema.safeParse(value);
  if (parsed.success) return [];
  return parsed.error.issues.map((i) => ({ path: i.path.join("."), message: i.message }));
}
