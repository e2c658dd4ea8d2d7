/**
 * Input of the member design checks and of the sizing search, parsed at every boundary (CLI,
 * route handlers) by these zod schemas. The member's own fields carry their unit in their name
 * (lengthFt, spacingIn, tributaryFt, bearingIn, unbracedLengthFt), as the flow's state does, so an
 * error's path names the flow's field. Within a load the solver contract's units hold: ft for
 * positions (x, from, to), psf, plf (w), lb (P), lb-ft (M), positive downward.
 */
import { z } from "zod";
import { geometryIssues, LIMITS } from "../beam/checks";
import { eitherMessage, LOAD_CASES, oneOfMessage, SUPPORT_TYPES, type BeamInput, type Load, type SupportType } from "../types";
import { DEFAULT_LOAD_STANDARD, LOAD_STANDARDS } from "../asce7/standard";
import { MEMBER_KINDS, WALL_FRAMINGS } from "./kinds";

const loadCase = z.enum(LOAD_CASES, { error: oneOfMessage(LOAD_CASES) });
const finite = (unit: string) => z.number({ error: `must be a number (${unit})` }).refine(Number.isFinite, `must be a finite number (${unit})`);
const positive = (unit: string) =>
  z.number({ error: `must be a number (${unit})` }).refine((v) => Number.isFinite(v) && v > 0, `must be a number greater than 0 (${unit})`);

export const areaLoadSchema = z
  .object({
    type: z.literal("area"),
    /** an occupancy preset id from OCCUPANCY_PRESETS instead of case and psf */
    preset: z.string().min(1).optional(),
    case: loadCase.optional(),
    psf: finite("psf").optional(),
    /** a partial area load from..to (ft); default the whole member */
    from: finite("ft").optional(),
    to: finite("ft").optional(),
    /** this load's own tributary width, ft (e.g. roof and floor above a header); default the member's spacing or tributary */
    tributaryFt: positive("ft").optional(),
  })
  .strict();

export const snowLoadSchema = z
  .object({
    type: z.literal("snow"),
    /** ground snow load, psf, from the map of the design's loadStandard (ASCE 7-16 or 7-22 §7.2) */
    pg: z.number().refine((v) => Number.isFinite(v) && v >= 0, "must be a number of 0 or more (psf)"),
    Ce: positive("exposure factor").optional(),
    Ct: positive("thermal factor").optional(),
    Is: positive("importance factor").optional(),
    from: finite("ft").optional(),
    to: finite("ft").optional(),
    tributaryFt: positive("ft").optional(),
  })
  .strict();

export const designLoadSchema = z.discriminatedUnion(
  "type",
  [
    areaLoadSchema,
    snowLoadSchema,
    z.object({ type: z.literal("point"), case: loadCase, x: finite("ft"), P: finite("lb") }).strict(),
    z.object({ type: z.literal("udl"), case: loadCase, from: finite("ft"), to: finite("ft"), w: finite("plf") }).strict(),
    z.object({ type: z.literal("linear"), case: loadCase, from: finite("ft"), to: finite("ft"), w1: finite("plf"), w2: finite("plf") }).strict(),
    z.object({ type: z.literal("moment"), case: loadCase, x: finite("ft"), M: finite("lb-ft") }).strict(),
  ],
  { error: 'must be a load of type "area", "snow", "udl", "point", "linear" or "moment"' },
);

const plies = z.number().int("must be a whole number of plies").min(1, "must be 1 to 4 plies").max(4, "must be 1 to 4 plies");

export const sawnMemberSchema = z
  .object({ material: z.literal("sawn"), species: z.string().min(1), grade: z.string().min(1), size: z.string().min(1), plies: plies.default(1) })
  .strict();
export const steelMemberSchema = z.object({ material: z.literal("steel"), shape: z.string().min(1), grade: z.string().min(1).default("A992") }).strict();
export const engineeredMemberSchema = z
  .object({ material: z.literal("engineered"), product: z.string().min(1), width: positive("in").optional(), depth: positive("in"), plies: plies.default(1) })
  .strict();

/** a wood I-joist by its table name, e.g. "PRI-40 11-7/8"; stiffeners = web stiffeners at the end bearings */
export const iJoistMemberSchema = z.object({ material: z.literal("ijoist"), joist: z.string().min(1), stiffeners: z.boolean().default(false) }).strict();

/** How two cold-formed C-sections make a header: back to back (webs together) or box (flanges toe to toe). */
export const CFS_ASSEMBLIES = ["single", "back-to-back", "box"] as const;
export type CfsAssembly = (typeof CFS_ASSEMBLIES)[number];

/**
 * A cold-formed steel C-section by its designation, e.g. "800S162-54", alone (joists, rafters) or two
 * of them as a header; stiffeners: true = bearing stiffeners at every support, false = none, not given =
 * added where the web needs them (the answer says where).
 */
export const cfsMemberSchema = z
  .object({
    material: z.literal("cfs"),
    section: z.string().min(1),
    assembly: z.enum(CFS_ASSEMBLIES, { error: oneOfMessage(CFS_ASSEMBLIES) }).default("single"),
    stiffeners: z.boolean().optional(),
  })
  .strict();

export const memberSchema = z.discriminatedUnion(
  "material",
  [sawnMemberSchema, steelMemberSchema, engineeredMemberSchema, iJoistMemberSchema, cfsMemberSchema],
  {
    error: 'must name a material: "sawn", "steel", "engineered", "ijoist" or "cfs"',
  },
);

export const DEFLECTION_PRESET_IDS = ["floor", "floor-tile", "roof-no-ceiling", "ceiling-flexible", "ceiling-brittle", "other"] as const;

export const conditionsSchema = z
  .object({
    /** wet service (moisture content over 19 % for sawn lumber, 16 % for glulam) */
    wet: z.boolean().default(false),
    /**
     * treated lumber incised (small slits in its faces) so the preservative enters; Ci, NDS 2018 §4.3.8.
     * Not given: incised for Douglas Fir-Larch, Hem-Fir and Spruce-Pine-Fir dimension lumber in wet
     * service or on a deck member, not incised otherwise (Southern Pine takes treatment without it).
     */
    incised: z.boolean().optional(),
    /**
     * member in a repetitive system (joists or rafters at 24 in or less, at least 3, sheathed); Cr, NDS
     * 2018 §4.3.9. Not given: yes for a floor-joist, deck-joist or rafter kind at 24 in or less, and for a
     * built-up member of 3 or more plies; false is honored for every member.
     */
    repetitive: z.boolean().optional(),
    /**
     * spacing of the braces of the top edge, ft; 0 = braced continuously (sheathing or decking fastened along
     * it). The braces hold the top edge only: where the member hogs, the bottom edge is in compression and is
     * taken as braced at the supports alone, unless bottomEdgeBraced says otherwise.
     */
    unbracedLengthFt: z
      .number()
      .refine((v) => Number.isFinite(v) && v >= 0, "must be 0 (continuously braced) or more (ft)")
      .default(0),
    /** the bottom edge is braced along its length (a ceiling fastened directly to it); not given: braced at the supports only */
    bottomEdgeBraced: z.boolean().default(false),
    selfWeight: z.boolean().default(true),
    /** sustained temperature, °F (NDS Table 2.3.3) */
    temperatureF: z
      .number()
      .refine((v) => Number.isFinite(v) && v <= 150, "must be at most 150 °F")
      .default(70),
    /** leave out uniform loads within d of each support in the shear check (NDS 2018 §3.4.3.1(a)) */
    shearIgnoreLoadsNearSupports: z.boolean().default(false),
    /** place live load span by span for the worst case (ASCE 7 §4.3.3, the same in 7-16 and 7-22) */
    patternLiveLoad: z.boolean().default(true),
  })
  .strict();

export const limitsSchema = z
  .object({
    preset: z.enum(DEFLECTION_PRESET_IDS, { error: `must be one of ${DEFLECTION_PRESET_IDS.join(", ")}` }).optional(),
    /** span/deflection for live (or snow, roof live) load; null = not checked */
    live: z
      .number()
      .refine((v) => Number.isFinite(v) && v > 0, "must be a number greater than 0 (L/n)")
      .nullable()
      .optional(),
    total: z
      .number()
      .refine((v) => Number.isFinite(v) && v > 0, "must be a number greater than 0 (L/n)")
      .nullable()
      .optional(),
  })
  .strict();

const designFields = {
  /** what the member is in the house: sets the repetitive, incised and wall-fit defaults and what the answer line tells the crew to build */
  kind: z.enum(MEMBER_KINDS, { error: oneOfMessage(MEMBER_KINDS) }).optional(),
  lengthFt: positive("ft").refine((v) => v <= LIMITS.maxLengthFt, `must be at most ${LIMITS.maxLengthFt} ft`),
  supports: z
    .array(z.object({ x: finite("ft"), type: z.enum(SUPPORT_TYPES, { error: eitherMessage(SUPPORT_TYPES) }) }).strict())
    .min(1, "give at least one support")
    // Capped here, before the cross-field check compares supports pair by pair.
    .max(LIMITS.maxSupports, `at most ${LIMITS.maxSupports} supports`),
  /** joist spacing, in on center */
  spacingIn: positive("in")
    .refine((v) => v <= 96, "must be at most 96 in")
    .optional(),
  /** tributary width, ft */
  tributaryFt: positive("ft")
    .refine((v) => v <= 60, "must be at most 60 ft")
    .optional(),
  loads: z.array(designLoadSchema).max(LIMITS.maxLoads, `at most ${LIMITS.maxLoads} loads`),
  /** bearing length at each support, in; default 1-1/2 in (IRC R502.6 minimum on wood or metal) */
  bearingIn: positive("in")
    .refine((v) => v <= 48, "must be at most 48 in")
    .default(1.5),
  conditions: conditionsSchema.default(() => conditionsSchema.parse({})),
  limits: limitsSchema.default({}),
  method: z.enum(["asd", "lrfd"], { error: 'must be "asd" or "lrfd"' }).default("asd"),
  /** the edition of ASCE 7 for the combinations and snow (the map the ground snow number comes from) */
  loadStandard: z.enum(LOAD_STANDARDS, { error: `must be one of ${LOAD_STANDARDS.map((s) => `"${s}"`).join(", ")}` }).default(DEFAULT_LOAD_STANDARD),
  /** the stud wall a header (or beam in a wall) sits in; only members that fill it are offered; default 2x4 for a header */
  wallFraming: z.enum(WALL_FRAMINGS, { error: `must be one of ${WALL_FRAMINGS.map((s) => `"${s}"`).join(", ")}` }).optional(),
  /** rough opening of a header, ft: the span is then the opening plus half the bearing at each end */
  roughOpeningFt: positive("ft")
    .refine((v) => v <= LIMITS.maxLengthFt, `must be at most ${LIMITS.maxLengthFt} ft`)
    .optional(),
};

/**
 * A header given by its rough opening: the span is the opening plus half the bearing at each end
 * (lengthFt = roughOpeningFt + bearingIn / 12), on two supports at its ends.
 */
function withRoughOpening(raw: unknown): unknown {
  if (raw === null || typeof raw !== "object" || Array.isArray(raw)) return raw;
  const o = raw as Record<string, unknown>;
  const ro = o.roughOpeningFt;
  if (typeof ro !== "number" || !Number.isFinite(ro) || ro <= 0 || o.lengthFt !== undefined) return raw;
  const bearing = typeof o.bearingIn === "number" && Number.isFinite(o.bearingIn) && o.bearingIn > 0 ? o.bearingIn : 1.5;
  const length = ro + bearing / 12;
  return {
    ...o,
    lengthFt: length,
    supports: o.supports ?? [
      { x: 0, type: "pin" },
      { x: length, type: "roller" },
    ],
  };
}

type RefineCtx = z.RefinementCtx;

/** Checks that need more than one field: spacing vs tributary, positions on the member, area load fields. */
function crossFieldIssues(
  v: {
    lengthFt: number;
    supports: { x: number; type: SupportType }[];
    spacingIn?: number;
    tributaryFt?: number;
    loads: z.infer<typeof designLoadSchema>[];
    roughOpeningFt?: number;
    bearingIn: number;
  },
  ctx: RefineCtx,
): void {
  if (v.roughOpeningFt !== undefined && Math.abs(v.lengthFt - (v.roughOpeningFt + v.bearingIn / 12)) > 1e-9) {
    ctx.addIssue({ code: "custom", path: ["roughOpeningFt"], message: "give the span (lengthFt) or the rough opening (roughOpeningFt), not both" });
  }
  const hasArea = v.loads.some((l) => (l.type === "area" || l.type === "snow") && l.tributaryFt === undefined);
  if (v.spacingIn !== undefined && v.tributaryFt !== undefined) {
    ctx.addIssue({ code: "custom", path: ["tributaryFt"], message: "give either spacingIn (joists) or tributaryFt (beams and headers), not both" });
  } else if (hasArea && v.spacingIn === undefined && v.tributaryFt === undefined) {
    ctx.addIssue({
      code: "custom",
      path: ["spacingIn"],
      message: "area loads (psf) need spacingIn (joists) or tributaryFt (beams and headers), here or on each area load",
    });
  }
  v.loads.forEach((l, i) => {
    if (l.type === "area") {
      if (l.preset === undefined && (l.case === undefined || l.psf === undefined)) {
        ctx.addIssue({ code: "custom", path: ["loads", i, l.case === undefined ? "case" : "psf"], message: "an area load needs case and psf, or a preset" });
      }
      if (l.preset !== undefined && (l.case !== undefined || l.psf !== undefined)) {
        ctx.addIssue({ code: "custom", path: ["loads", i, "preset"], message: "give a preset or case and psf, not both" });
      }
    }
    if ((l.type === "area" || l.type === "snow") && (l.from !== undefined || l.to !== undefined)) {
      const from = l.from ?? 0;
      const to = l.to ?? v.lengthFt;
      if (!(from >= 0 && to <= v.lengthFt && to > from)) {
        ctx.addIssue({
          code: "custom",
          path: ["loads", i, l.to !== undefined ? "to" : "from"],
          message: `must lie on the member, 0 to ${v.lengthFt} ft, with to > from`,
        });
      }
    }
  });
  const lineLoads: Load[] = v.loads.filter((l): l is Exclude<typeof l, { type: "area" } | { type: "snow" }> => l.type !== "area" && l.type !== "snow");
  const lineIndex = v.loads.map((l, i) => (l.type !== "area" && l.type !== "snow" ? i : -1)).filter((i) => i >= 0);
  const beam: BeamInput = { length: v.lengthFt, E: 1, I: 1, supports: v.supports, loads: lineLoads };
  if (!(Number.isFinite(v.lengthFt) && v.lengthFt > 0)) return;
  for (const issue of geometryIssues(beam)) {
    if (issue.path === "length") continue;
    const parts = issue.path.split(".");
    if (parts[0] === "loads") parts[1] = String(lineIndex[Number(parts[1])]);
    ctx.addIssue({ code: "custom", path: parts.map((p) => (/^\d+$/.test(p) ? Number(p) : p)), message: issue.message });
  }
}

/** The check input's fields as sent (the request type the flow builds); checkInputSchema adds the rough opening and cross-field rules. */
export const checkFieldsSchema = z.object({ member: memberSchema, ...designFields }).strict();
export const checkInputSchema = z.preprocess(withRoughOpening, checkFieldsSchema.superRefine(crossFieldIssues));

export const sizeFamilySchema = z.discriminatedUnion(
  "material",
  [
    z
      .object({
        material: z.literal("sawn"),
        species: z.string().min(1).optional(),
        grade: z.string().min(1).optional(),
        /** plies to try; default 1 for joists at a spacing, 1 to 4 otherwise */
        plies: z.array(plies).min(1).optional(),
      })
      .strict(),
    z.object({ material: z.literal("steel"), grade: z.string().min(1).default("A992") }).strict(),
    z.object({ material: z.literal("engineered"), product: z.string().min(1).optional(), plies: z.array(plies).min(1).optional() }).strict(),
    /** wood I-joists, one series or every one */
    z.object({ material: z.literal("ijoist"), series: z.string().min(1).optional(), stiffeners: z.boolean().default(false) }).strict(),
    /** cold-formed steel C-sections: joists and rafters one at a spacing, headers two back to back or boxed */
    z
      .object({
        material: z.literal("cfs"),
        /** flange widths to try, in (1.62, 2, 2.5); default every one */
        flanges: z.array(positive("in")).min(1).optional(),
        /** header assemblies to try; default both back-to-back and box for a beam or header, single for joists */
        assemblies: z
          .array(z.enum(CFS_ASSEMBLIES, { error: oneOfMessage(CFS_ASSEMBLIES) }))
          .min(1)
          .optional(),
        stiffeners: z.boolean().optional(),
      })
      .strict(),
    z.object({ material: z.literal("any") }).strict(),
  ],
  { error: 'must name a family: material "sawn", "engineered", "ijoist", "cfs", "steel" or "any"' },
);

/** The size input's fields as sent (the request type the flow builds); sizeInputSchema adds the rough opening and cross-field rules. */
export const sizeFieldsSchema = z
  .object({
    member: sizeFamilySchema.default({ material: "any" }),
    ...designFields,
    /** how passing members are ranked */
    rank: z.enum(["weight", "depth", "cost"], { error: 'must be "weight", "depth" or "cost"' }).default("weight"),
    /** how many passing members and how many nearest failures to return */
    limit: z.number().int().min(1).max(500).default(20),
    failures: z.number().int().min(0).max(100).default(5),
    /** how many of the best passing members carry their whole check (checks, diagrams, answer), as /api/check gives it */
    fullChecks: z.number().int("must be a whole number").min(0, "must be 0 to 20").max(20, "must be 0 to 20").default(0),
  })
  .strict();
export const sizeInputSchema = z.preprocess(withRoughOpening, sizeFieldsSchema.superRefine(crossFieldIssues));

export const spanInputSchema = z
  .object({
    member: memberSchema,
    ...designFields,
    /** search range for the largest span, ft */
    minLengthFt: positive("ft").default(1),
    maxLengthFt: positive("ft")
      .refine((v) => v <= LIMITS.maxLengthFt, `must be at most ${LIMITS.maxLengthFt} ft`)
      .default(40),
    /** bisection stops when the bracket is narrower than this, in */
    toleranceIn: positive("in").default(0.05),
  })
  .strict()
  .superRefine(crossFieldIssues);

export type CheckInput = z.infer<typeof checkInputSchema>;
export type SizeInput = z.infer<typeof sizeInputSchema>;
export type SpanInput = z.infer<typeof spanInputSchema>;
export type MemberSpec = z.infer<typeof memberSchema>;
export type SizeFamily = z.infer<typeof sizeFamilySchema>;
export type DesignLoad = z.infer<typeof designLoadSchema>;
export type DesignConditions = z.infer<typeof conditionsSchema>;
export type DeflectionPresetId = (typeof DEFLECTION_PRESET_IDS)[number];
