/**
 * The edition of ASCE/SEI 7 a design follows. It sets the load combinations and how snow enters
 * them (see combinations.ts and snow.ts). ASCE 7-16 is the default: most jurisdictions (IRC 2021 and
 * earlier) still publish ground snow on its allowable-stress basis, and for a given number it is
 * the safe reading (the number counts at full value in D + S).
 */
export const LOAD_STANDARDS = ["ASCE 7-16", "ASCE 7-22"] as const;
export type LoadStandard = (typeof LOAD_STANDARDS)[number];
export const DEFAULT_LOAD_STANDARD: LoadStandard = "ASCE 7-16";

/** Plain words for the map a ground snow number comes from, as the flow asks it. */
export const LOAD_STANDARD_WORDS: Readonly<Record<LoadStandard, string>> = {
  "ASCE 7-16": "ground snow from the map in the 2021 code or older (ASCE 7-16)",
  "ASCE 7-22": "ground snow from the newer risk-based map (2024 code, ASCE 7-22)",
};
