/**
 * The edition of Spanlark's design rules. It changes when a change to the checks themselves (not to the
 * material tables, which carry their own version) can change a saved answer; an answer records the edition it
 * was worked out on, and a job holding an answer from an earlier edition is worked out again when it is next
 * opened (lib/jobs/service.ts#recheckIfOutdated), each changed answer flagged with DESIGN_RULES_CHANGE.
 * DEVELOPERS.md ("Design rule editions") lists every edition and what changed.
 */
export const DESIGN_RULES = "2026-12-05";

/** Why answers changed in the newest edition, as the job page and the crew link show it. */
export const DESIGN_RULES_CHANGE =
  "the design checks changed: each point load now says the bearing it needs on the member, an I-joist that hogs says where to brace its bottom flange, and built-up beams are offered in 2x plies only";
