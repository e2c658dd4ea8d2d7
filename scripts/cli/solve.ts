// `npm run --silent solve -- FILE`: one beam as JSON in, its analysis as JSON out (issue 3 contract).
import { BeamInputError, BeamInstabilityError, solve, type SolveOutput } from "../../lib/solver/beam";
import { beamInputSchema } from "../../lib/solver/schema";
import { CliInputError, describeZodError } from "./errors";

export function run(json: unknown, flags: string[]): SolveOutput {
  if (flags.length) throw new CliInputError(`unknown option ${flags[0]} (solve takes none)`);
  const parsed = beamInputSchema.safeParse(json);
  if (!parsed.success) throw new CliInputError(describeZodError(parsed.error));
  try {
    return solve(parsed.data);
  } catch (err) {
    if (err instanceof BeamInstabilityError || err instanceof BeamInputError) throw new CliInputError(err.message);
    throw err;
  }
}
