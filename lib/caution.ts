/**
 * The safety caution and what Spanlark does not check: one place, so the answer screen, the routes
 * and the CLI, the crew link, the job sheet (page and PDF), the home page and the e-mails say the same.
 * Wording from DESIGN.md. Plain text: no React, no server code, so every layer can import it.
 */

export const CAUTION_TITLE = "Check before you build";

/** DESIGN.md's caution: on every answer, crew link, job sheet and result. */
export const CAUTION =
  "Preliminary sizing for typical house framing. Check loads, spans and supports on site. " +
  "Your local building code and building official govern; have a licensed engineer review anything unusual — " +
  "long spans, heavy point loads, steel, or anything this tool does not check (connections, fasteners, posts, footings, lateral loads).";

/** What the member checks leave to others: carried by every design result, listed in full on sheets and the crew link. */
export const NOT_CHECKED: readonly string[] = [
  "Connections and hangers",
  "Fasteners: nails, screws, bolts and their spacing",
  "Posts, studs, columns and footings, and the plates or walls under the bearing (bearing is checked on this member only; under a steel header in a stud wall the wood under its flanges is checked too). Posts and footings added to a job are checked for axial load and soil bearing only: not bending in the post, uplift, post bases and anchors, steel columns, or the concrete's own strength",
  "Lateral loads: wind and earthquake on the building, bracing and shear walls; wind on this member beyond the loads given",
  "Point loads on joists without blocking or a beam under them",
  "The post, beam or truss that bears on this member at a point load, and its connection (the bearing it needs on this member is given with the answer)",
  "Notches, holes and cuts in the member",
  "Floor vibration and bounce beyond the deflection limits",
  "Ponding on low-slope roofs, snow drifts, sliding and unbalanced snow",
  "Fire resistance, decay and insect protection",
];

/** What the cold-formed steel checks leave to others: added wherever a cold-formed steel member is shown. */
export const NOT_CHECKED_COLD_FORMED: readonly string[] = [
  "Cold-formed steel: web holes beyond the standard punchouts, and punchouts near a support or point load",
  "Cold-formed steel: screws, clips, hangers and connections, and the fastening of bearing stiffeners",
  "Cold-formed steel: the bridging, blocking and strapping that brace the flange not sheathed (bottom flange over interior supports), and their connections. Flange roll (distortional buckling) is checked, crediting no restraint from sheathing, none from bridging or blocking for the bottom flange, and for the top flange only at the brace spacing given",
];

/** The not-checked list for the materials shown: the common list, and the cold-formed steel items when one is cold-formed steel. */
export function notCheckedFor(materials: readonly (string | null | undefined)[]): readonly string[] {
  return materials.some((m) => m === "cfs") ? [...NOT_CHECKED, ...NOT_CHECKED_COLD_FORMED] : NOT_CHECKED;
}

/** What a beam analysis on its own (POST /api/solve, `npm run solve`) does not check. */
export const ANALYSIS_NOT_CHECKED =
  "This is the analysis of a straight beam with constant EI (shear deformation, axial load and the member's strength are not included); it does not check the member, bearing, connections, fasteners, posts, footings or lateral loads.";
