/**
 * The zod schema of the solver input (issue 3 contract), shared by the CLI, POST /api/solve and
 * any server action. Every rejection names the field and the reason, in the units of the trade.
 */
import { z } from "zod";
import { geometryIssues, LIMITS } from "./beam/checks";
import { eitherMessage, LOAD_CASES, oneOfMessage, SUPPORT_TYPES, type BeamInput } from "./types";

function num(unit: string) {
  return z.number({
    error: (iss) => (iss.input === undefined ? `is required (${unit})` : `must be a finite number (${unit})`),
  });
}

const loadCase = z.enum(LOAD_CASES, { error: oneOfMessage(LOAD_CASES) });

const supportSchema = z.object({
  x: num("ft"),
  type: z.enum(SUPPORT_TYPES, { error: eitherMessage(SUPPORT_TYPES) }),
});

const pointLoad = z.object({ type: z.literal("point"), x: num("ft"), P: num("lb"), case: loadCase.optional() });
const udlLoad = z.object({ type: z.literal("udl"), from: num("ft"), to: num("ft"), w: num("plf"), case: loadCase.optional() });
const linearLoad = z.object({
  type: z.literal("linear"),
  from: num("ft"),
  to: num("ft"),
  w1: num("plf"),
  w2: num("plf"),
  case: loadCase.optional(),
});
const momentLoad = z.object({ type: z.literal("moment"), x: num("ft"), M: num("lb-ft"), case: loadCase.optional() });

const loadSchema = z.discriminatedUnion("type", [pointLoad, udlLoad, linearLoad, momentLoad], {
  error: 'must be "point", "udl", "linear" or "moment"',
});

/** One beam, as `npm run solve` and POST /api/solve read it. */
export const beamInputSchema = z
  .object(
    {
      length: num("ft").gt(0, "must be greater than 0 ft").max(LIMITS.maxLengthFt, `must be at most ${LIMITS.maxLengthFt} ft`),
      E: num("psi").gt(0, "must be greater than 0 psi"),
      I: num("in^4").gt(0, "must be greater than 0 in^4"),
      supports: z.array(supportSchema, { error: "must be a list of supports" }).max(LIMITS.maxSupports, `at most ${LIMITS.maxSupports} supports`),
      loads: z.array(loadSchema, { error: "must be a list of loads" }).max(LIMITS.maxLoads, `at most ${LIMITS.maxLoads} loads`),
      at: z.array(num("ft"), { error: "must be a list of stations (ft)" }).max(LIMITS.maxStations, `at most ${LIMITS.maxStations} stations`).optional(),
    },
    { error: "must be a JSON object with length, E, I, supports and loads" },
  )
  .superRefine((v, ctx) => {
    // The single-field limits above already spoke; add the checks across fields.
    for (const issue of geometryIssues(v as BeamInput)) {
      if (!issue.path.includes(".")) continue;
      ctx.addIssue({
        code: "custom",
        path: issue.path.split(".").map((p) => (/^\d+$/.test(p) ? Number(p) : p)),
        message: issue.message,
      });
    }
  });

export type BeamInputParsed = z.infer<typeof beamInputSchema>;
