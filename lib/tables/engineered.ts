import type { EngineeredProduct, EngineeredSizeRule } from "./types";

/**
 * Generic engineered lumber rows: LVL, PSL and glulam. Units: psi, in, lb/ft³.
 *
 * These are not one maker's product. LVL and PSL values are typical of published literature for
 * the named E grade; every maker publishes its own, and the maker's values govern. The 2.0E LVL and
 * PSL rows agree with one maker's published 2.0E values as an open-source data file reproduces
 * them (qsaad/stroogle data/wood/EngineeredSpecies.js); the 1.9E LVL row was not checked. Glulam
 * values are the NDS Supplement (2018 edition) Table 5A reference values for the named combination;
 * the open-source published copies found disagree on Fbx− (1,450 vs 1,850 psi for 24F-V4; balanced or
 * not for 24F-1.8E), so the glulam rows stay from memory and flagged. Searched again for a readable
 * Table 5A (or APA's Glulam Design Specification / EWS Y117 tables) by the combination and its values
 * (24F-V4 2400/1850/650/265/1.8; 24F-1.8E 2400/1450): the copies found (studylib, docslib) show only
 * their covers and contents in the text that can be read. The 1.9E LVL row has no standard table to
 * check against (each maker publishes its own): it stays flagged, and its note tells the builder to
 * confirm with the supplier's published values.
 */

export const SUPPLIER_NOTE = "typical values — confirm with the supplier's published values";

/**
 * Emin from E, NDS 2018 Appendix D (Eq. D-4): Emin = E (1 − 1.645 COV_E) k / 1.66, with COV_E =
 * 0.10 for LVL and PSL and k the adjustment from apparent to pure-bending E (1.03 for sawn
 * lumber, 1.05 for glulam). Makers of LVL and PSL publish their own Emin; the default k = 1.0
 * here gives about 0.503 E, a little below the typical published figures (about 0.508 E).
 * Example: E = 2,000,000 psi gives Emin = 1,006,627 psi.
 */
export function eminFromE(E: number, covE = 0.1, k = 1.0): number {
  return (E * (1 - 1.645 * covE) * k) / 1.66;
}

/**
 * Depth size factor typical of LVL and PSL literature: CF = (refDepth/d)^exponent, at most
 * maxFactor. Applies to Fb. Example: LVL at d = 16 in, (12/16)^0.136 = 0.962.
 */
export function depthSizeFactor(rule: Extract<EngineeredSizeRule, { type: "depth" }>, dIn: number): number {
  return Math.min((rule.refDepthIn / dIn) ** rule.exponent, rule.maxFactor);
}

/**
 * Glulam volume factor, NDS 2018 5.3.6 (Eq. 5.3-1): CV = (21/L)^(1/x) (12/d)^(1/x) (5.125/b)^(1/x) ≤ 1.0,
 * L = length between points of zero moment (ft), d depth (in), b width (in; for multi-piece
 * laminations the widest piece), x = 20 for Southern Pine, 10 for all other species.
 * Example: 5-1/8 x 18, L = 24 ft, x = 10: (21/24 · 12/18 · 1)^0.1 = 0.947.
 */
export function glulamVolumeFactorCV(x: number, lengthFt: number, dIn: number, bIn: number): number {
  const cv = ((21 / lengthFt) * (12 / dIn) * (5.125 / bIn)) ** (1 / x);
  return Math.min(cv, 1.0);
}

const LVL_DEPTH_RULE: EngineeredSizeRule = { type: "depth", refDepthIn: 12, exponent: 0.136, maxFactor: 1.18 };
const PSL_DEPTH_RULE: EngineeredSizeRule = { type: "depth", refDepthIn: 12, exponent: 0.111, maxFactor: 1.15 };
const WESTERN_VOLUME_RULE: EngineeredSizeRule = { type: "volume", x: 10 };
/** NDS 2018 §5.3.6: x = 20 for Southern Pine glulam */
const SOUTHERN_VOLUME_RULE: EngineeredSizeRule = { type: "volume", x: 20 };

const LVL_DEPTHS = [7.25, 9.25, 9.5, 11.25, 11.875, 14, 16, 18];
const PSL_DEPTHS = [9.25, 9.5, 11.25, 11.875, 14, 16, 18];
/** western-species glulam builds up in 1-1/2 in laminations */
const GLULAM_WESTERN_DEPTHS = [9, 10.5, 12, 13.5, 15, 16.5, 18, 19.5, 21, 22.5, 24];
/** Southern Pine glulam builds up in 1-3/8 in laminations: 7 to 17 laminations */
const GLULAM_SOUTHERN_DEPTHS = [7, 8, 9, 10, 11, 12, 13, 14, 15, 16, 17].map((n) => n * 1.375);
/** framing-width glulam matches lumber and I-joist depths */
const GLULAM_FRAMING_DEPTHS = [9.25, 11.25, 11.875, 14, 16, 18];

const SCL_SOURCE =
  "typical values for this E grade — confirm with the supplier; Fb, Fv, Fc⊥, E checked against one maker's published 2.0E values (qsaad/stroogle EngineeredSpecies.js)";
const SCL_SOURCE_UNCHECKED = "typical values for this E grade — confirm with the supplier; from memory — verify against the supplier's published values";
const T5A_V4 =
  "NDS Supplement 2018, Table 5A; Fbx+, Fvx, Fc⊥x, Ex, Ex min checked against three open-source published copies (Python, TypeScript, Zig); Fbx− not settled (1,850 or 1,450, the lower used): from memory — verify against the printed table";
const T5A_V3 =
  "NDS Supplement 2018, Table 5A; Fbx+, Fvx, Fc⊥x, Ex, Ex min checked against two open-source published copies (a Kotlin WoodPropertyService, a Python glulam table); Fbx− from memory — verify against the printed table";
const T5A_18E =
  "NDS Supplement 2018, Table 5A; Fbx+, Fvx, Fc⊥x, Ex, Ex min checked against an open-source published copy (a Zig glulam table); Fbx− 1,450 held where that copy gives 2,400 (balanced): from memory — verify";

export const ENGINEERED: EngineeredProduct[] = [
  {
    name: "LVL 1.9E",
    kind: "LVL",
    Fb: 2600,
    Fv: 285,
    FcPerp: 750,
    E: 1_900_000,
    Emin: Math.round(eminFromE(1_900_000)),
    sizeRule: LVL_DEPTH_RULE,
    widths: [1.75],
    depths: LVL_DEPTHS,
    density: 42,
    note: SUPPLIER_NOTE,
    source: SCL_SOURCE_UNCHECKED,
  },
  {
    name: "LVL 2.0E",
    kind: "LVL",
    Fb: 2600,
    Fv: 285,
    FcPerp: 750,
    E: 2_000_000,
    Emin: Math.round(eminFromE(2_000_000)),
    sizeRule: LVL_DEPTH_RULE,
    widths: [1.75],
    depths: LVL_DEPTHS,
    density: 42,
    note: `${SUPPLIER_NOTE}; several makers publish Fb 2,900–3,100 psi for 2.0E, the lower figure is kept here`,
    source: SCL_SOURCE,
  },
  {
    name: "PSL 2.0E",
    kind: "PSL",
    Fb: 2900,
    Fv: 290,
    FcPerp: 625,
    E: 2_000_000,
    Emin: Math.round(eminFromE(2_000_000)),
    sizeRule: PSL_DEPTH_RULE,
    widths: [3.5, 5.25],
    depths: PSL_DEPTHS,
    density: 45,
    note: SUPPLIER_NOTE,
    source: SCL_SOURCE,
  },
  {
    // Table 5A, 24F-V4 Douglas Fir-Larch, bending about x-x: Fbx+ 2400, Fc⊥x 650, Fvx 265, Ex 1.8 × 10⁶,
    // Ex min 0.95 × 10⁶ psi, as open-source published copies give them (exact-string search, repositories
    // not named): a Python roof-beam module ("24F-V4 DF, NDS Supplement Table 5A": 2400, 265, 650,
    // 1,800,000), a TypeScript GLULAM table ("24F-V4 DF/DF (unbalanced)": 2400, 265, 650, 1,800,000,
    // Ex_min 950,000) and a Zig glulam table ("NDS Supplement Table 5A/5B": the same five). Unbalanced:
    // Fbx− applies where the member hogs (over supports, on cantilevers). The copies disagree on Fbx−
    // (TypeScript 1,850, Zig 1,450 — the value of its stress class 24F-1.8E); the lower is used until a
    // printed table settles it (the first starter tables held 1,850; see PREVIOUS_STARTER_VALUES in
    // db/cited-update.ts).
    name: "Glulam 24F-V4 DF",
    kind: "glulam",
    Fb: 2400,
    FbNeg: 1450,
    Fv: 265,
    FcPerp: 650,
    E: 1_800_000,
    Emin: 950_000,
    sizeRule: WESTERN_VOLUME_RULE,
    widths: [3.125, 5.125, 6.75],
    depths: GLULAM_WESTERN_DEPTHS,
    density: 35,
    note: SUPPLIER_NOTE,
    source: T5A_V4,
  },
  {
    // Table 5A, 24F-1.8E: Fbx+ 2400, Fbx− 1450 (the table's unbalanced figure; many stock beams
    // are balanced and carry 2400 both ways — take that only from the supplier's literature),
    // Fc⊥x 650, Fvx 265 (western species), Ex 1.8 × 10⁶, Ex min 0.95 × 10⁶ psi. The Zig glulam table
    // (exact-string search, repository not named) agrees on all but Fbx−, which it gives balanced (2400).
    // x = 10 (western species) is kept for the volume factor, the larger reduction.
    name: "Glulam 24F-1.8E",
    kind: "glulam",
    Fb: 2400,
    FbNeg: 1450,
    Fv: 265,
    FcPerp: 650,
    E: 1_800_000,
    Emin: 950_000,
    sizeRule: WESTERN_VOLUME_RULE,
    widths: [3.125, 5.125],
    depths: GLULAM_WESTERN_DEPTHS,
    density: 35,
    note: SUPPLIER_NOTE,
    source: T5A_18E,
  },
  {
    // Table 5A layup combination 24F-V3, Southern Pine, bending about x-x: Fbx+ 2400, Fbx− 1950,
    // Fc⊥x 740, Fvx 300, Ex 1.8 × 10⁶, Ex min 0.95 × 10⁶ psi. Fbx+, Fvx, Fc⊥x and Ex agree with a Kotlin
    // WoodPropertyService ("24F-V3 1.8E SP/SP": 2400, 300, 740, 1.8 × 10⁶) and a Python glulam table
    // (the same four and Ex min 0.95 × 10⁶); no copy gives Fbx− (from memory). Unbalanced. x = 20 in the
    // volume factor (NDS 2018 §5.3.6), laminations 1-3/8 in.
    name: "Glulam 24F-V3 SP",
    kind: "glulam",
    Fb: 2400,
    FbNeg: 1950,
    Fv: 300,
    FcPerp: 740,
    E: 1_800_000,
    Emin: 950_000,
    sizeRule: SOUTHERN_VOLUME_RULE,
    widths: [3, 5],
    depths: GLULAM_SOUTHERN_DEPTHS,
    density: 36,
    note: SUPPLIER_NOTE,
    source: T5A_V3,
  },
  {
    // The same combination in framing widths (3-1/2 and 5-1/2 in) and lumber depths.
    name: "Glulam 24F-1.8E framing width",
    kind: "glulam",
    Fb: 2400,
    FbNeg: 1450,
    Fv: 265,
    FcPerp: 650,
    E: 1_800_000,
    Emin: 950_000,
    sizeRule: WESTERN_VOLUME_RULE,
    widths: [3.5, 5.5],
    depths: GLULAM_FRAMING_DEPTHS,
    density: 35,
    note: SUPPLIER_NOTE,
    source: T5A_18E,
  },
];
