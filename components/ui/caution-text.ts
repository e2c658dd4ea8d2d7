// The safety caution, in one place so the screens, the crew link and the job sheet (PDF) say the same thing.
// Plain text only: no React, so the server's PDF code can import it too.

export const CAUTION_TITLE = "Check before you build";

/** DESIGN.md's caution: shown on every screen that gives an answer. */
export const CAUTION_TEXT =
  "Preliminary sizing for typical house framing. Check loads, spans and supports on site. " +
  "Your local building code and building official govern; have a licensed engineer review anything unusual — " +
  "long spans, heavy point loads, steel, or anything this tool does not check (connections, fasteners, posts, footings, lateral loads).";

/** What Spanlark does not check, listed in full on job sheets. */
export const NOT_CHECKED: readonly string[] = [
  "Connections and hangers",
  "Fasteners: nails, screws, bolts and their spacing",
  "Posts, columns and footings under the reactions",
  "Lateral loads: wind and earthquake bracing, shear walls",
  "Point loads on joists without blocking or a beam under them",
  "Ponding on low-slope roofs",
  "Floor vibration and bounce beyond the deflection limits",
];

/** The full caution for sheets: the text above, then the list of what is not checked. */
export const CAUTION_FULL_TEXT = `${CAUTION_TEXT}\nNot checked: ${NOT_CHECKED.join("; ")}.`;
