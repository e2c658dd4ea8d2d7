/**
 * What each check is called, in one place: the answer's verdict ("OK 77% (bending)"), the ratio bars'
 * titles, the crew link, the job sheet and its PDF all read it. Pure.
 */
import type { CheckName } from "./types";

export interface CheckWords {
  /** in a sentence: "Over 113% (live load deflection)", "bending governs" */
  words: string;
  /** as a heading over its ratio bar */
  title: string;
}

export const CHECK_WORDS: Readonly<Record<CheckName, CheckWords>> = {
  bending: { words: "bending", title: "Bending" },
  shear: { words: "shear", title: "Shear" },
  "deflection-live": { words: "live load deflection", title: "Deflection, live load" },
  "deflection-total": { words: "total load deflection", title: "Deflection, total load" },
  bearing: { words: "bearing", title: "Bearing on the supports" },
  stability: { words: "lateral stability", title: "Sideways buckling (lateral stability)" },
  "web-yielding": { words: "web yielding at a support", title: "Web yielding" },
  "web-crippling": { words: "web crippling at a support", title: "Web crippling" },
  "web-compactness": { words: "web slenderness", title: "Web compactness" },
  "bending-crippling": { words: "bending with web crippling", title: "Bending with web crippling" },
  "bending-shear": { words: "bending with shear", title: "Bending with shear" },
  "flange-roll": { words: "flange roll (distortional buckling)", title: "Flange roll (distortional buckling, AISI S100-16 §F4)" },
  "thickness-scope": { words: "steel thickness outside the checked range", title: "Steel thickness outside the checked range" },
};

function known(name: string): name is CheckName {
  return Object.prototype.hasOwnProperty.call(CHECK_WORDS, name);
}

/** The check in a sentence ("live load deflection"); "—" for none; a name from a newer version reads with its hyphens as spaces. */
export function checkWords(name: string | null): string {
  if (!name) return "—";
  return known(name) ? CHECK_WORDS[name].words : name.replace(/-/g, " ");
}

/** The check as a heading ("Deflection, live load"). */
export function checkTitle(name: string | null): string {
  if (!name) return "—";
  if (known(name)) return CHECK_WORDS[name].title;
  const plain = name.replace(/-/g, " ");
  return plain.charAt(0).toUpperCase() + plain.slice(1);
}
