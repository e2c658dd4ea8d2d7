/**
 * Basic load combinations of ASCE/SEI 7 (Minimum Design Loads and Associated Criteria for Buildings
 * and Other Structures), 2016 and 2022 editions, limited to the cases Spanlark carries:
 * D, L, Lr, S, W (no rain R, seismic E, fluid F, soil H or self-straining T).
 *
 * The editions differ in the basis of snow. ASCE 7-16 (and IRC 2021 and earlier) maps ground snow
 * on the allowable-stress basis: S enters the ASD combinations at full value (D + S,
 * D + 0.75L + 0.75S) and the LRFD ones at 1.6S leading, 0.5S as a companion. ASCE 7-22 maps
 * strength-level ground snow: 0.7S in ASD (§2.4.1 combinations 3a, 4a, 6a as STRUCTURE magazine's
 * "ASCE 7-22 Flat Roof Snow Load versus Minimum Snow Load" excerpts them), 1.0S leading in LRFD
 * (φRn = 1.2D + 1.0S, STRUCTURE magazine, February 2022, "Ground Snow Loads for ASCE 7-22") and 0.3S
 * as the companion: see lrfdCombinations.
 */
import type { Combination, LoadCase, NamedCombination } from "../types";
import { LOAD_CASES } from "../types";
import { DEFAULT_LOAD_STANDARD, type LoadStandard } from "./standard";

/** "Lr or 0.7S" style alternatives are expanded into one combination per roof load present. */
type Term = { c: LoadCase; f: number };

function name(terms: Term[]): string {
  const parts: string[] = [];
  for (const t of terms) {
    if (t.f === 0) continue;
    const coef = t.f === 1 ? "" : String(Math.round(t.f * 1e4) / 1e4);
    parts.push(`${coef}${t.c}`);
  }
  return parts.join("+");
}

/**
 * Keeps the terms of the cases present and drops combinations that can never govern for load
 * effects that are linear (every effect here is): exact duplicates; a combination written for a
 * variable load that is absent (e.g. 0.6D+0.6W without wind); and one that adds a single variable
 * load X at a smaller factor than another combination with the same dead load factor, when that
 * dead load alone is listed too (D+0.75L lies between D and D+L, so one of those two governs).
 */
function build(raw: { terms: Term[]; needs: LoadCase[] }[], cases: LoadCase[]): NamedCombination[] {
  const present = new Set(cases);
  const out: NamedCombination[] = [];
  const seen = new Set<string>();
  for (const r of raw) {
    if (r.needs.some((c) => !present.has(c))) continue;
    const terms = r.terms.filter((t) => present.has(t.c) && t.f !== 0);
    if (terms.length === 0) continue;
    const factors: Combination = {};
    for (const t of terms) factors[t.c] = (factors[t.c] ?? 0) + t.f;
    const key = LOAD_CASES.map((c) => factors[c] ?? 0).join(",");
    if (seen.has(key)) continue;
    seen.add(key);
    out.push({ name: name(terms), factors });
  }
  const variables = (c: Combination) => LOAD_CASES.filter((k) => k !== "D" && (c[k] ?? 0) !== 0);
  return out.filter((c) => {
    const vars = variables(c.factors);
    if (vars.length !== 1) return true;
    const x = vars[0];
    const d = c.factors.D ?? 0;
    const deadAlone = out.some((o) => variables(o.factors).length === 0 && (o.factors.D ?? 0) === d);
    const larger = out.some((o) => {
      const ov = variables(o.factors);
      return ov.length === 1 && ov[0] === x && (o.factors.D ?? 0) === d && (o.factors[x] ?? 0) > (c.factors[x] ?? 0);
    });
    return !(deadAlone && larger);
  });
}

const T = (c: LoadCase, f: number): Term => ({ c, f });

/**
 * Factor on S in the ASD combinations: 1.0 in ASCE 7-16 §2.4.1 (D + (Lr or S or R)), 0.7 in
 * ASCE 7-22 §2.4.1 (D + (Lr or 0.7S or R)), whose maps are strength level.
 */
export function asdSnowFactor(standard: LoadStandard): number {
  return standard === "ASCE 7-22" ? 0.7 : 1.0;
}

/**
 * ASCE 7 §2.4.1 basic combinations for allowable stress design (combinations 1–7 without E), in the
 * edition given. ASCE 7-16: D; D+L; D+(Lr or S); D+0.75L+0.75(Lr or S); D+0.6W;
 * D+0.75L+0.75(0.6W)+0.75(Lr or S); 0.6D+0.6W. ASCE 7-22: the same with 0.7S in place of S.
 */
export function asdCombinations(cases: LoadCase[] = [...LOAD_CASES], standard: LoadStandard = DEFAULT_LOAD_STANDARD): NamedCombination[] {
  const roof: { t: Term; c: LoadCase }[] = [
    { t: T("Lr", 1), c: "Lr" },
    { t: T("S", asdSnowFactor(standard)), c: "S" },
  ];
  const raw: { terms: Term[]; needs: LoadCase[] }[] = [];
  // (1) D
  raw.push({ terms: [T("D", 1)], needs: [] });
  // (2) D + L
  raw.push({ terms: [T("D", 1), T("L", 1)], needs: ["L"] });
  // (3) D + (Lr or S or R) [7-16]; D + (Lr or 0.7S or R) [7-22]
  for (const r of roof) raw.push({ terms: [T("D", 1), r.t], needs: [r.c] });
  // (4) D + 0.75L + 0.75(Lr or 0.7S or R)
  for (const r of roof) raw.push({ terms: [T("D", 1), T("L", 0.75), T(r.c, 0.75 * r.t.f)], needs: [r.c] });
  // (5) D + 0.6W
  raw.push({ terms: [T("D", 1), T("W", 0.6)], needs: ["W"] });
  // (6a) D + 0.75L + 0.75(0.6W) + 0.75(Lr or 0.7S or R)
  raw.push({ terms: [T("D", 1), T("L", 0.75), T("W", 0.45)], needs: ["W"] });
  for (const r of roof) raw.push({ terms: [T("D", 1), T("L", 0.75), T("W", 0.45), T(r.c, 0.75 * r.t.f)], needs: ["W", r.c] });
  // (7) 0.6D + 0.6W
  raw.push({ terms: [T("D", 0.6), T("W", 0.6)], needs: ["W"] });
  return build(raw, cases);
}

/** Factor on S as a companion load in ASCE 7-22 §2.3.1 combinations 2 and 4 (see lrfdCombinations). */
export const LRFD_SNOW_COMPANION_22 = 0.3;

/**
 * ASCE 7 §2.3.1 basic combinations for strength design (LRFD), combinations 1–5 without E.
 * ASCE 7-16: 1.4D; 1.2D+1.6L+0.5(Lr or S or R); 1.2D+1.6(Lr or S or R)+(L or 0.5W);
 * 1.2D+1.0W+L+0.5(Lr or S or R); 0.9D+1.0W (as reproduced on public pages of the 2016 text).
 * ASCE 7-22: snow is strength level, 1.0S leading (checked, see the module comment) and 0.3S as the
 * companion in combinations 2 and 4, as an open-source published copy of the 2022 strength combinations
 * lists them ("2a-2: 1.2D + 1.6L + 0.3S", "3a-3: 1.2D + 1.0S + L", "4a-2: 1.2D + 1.0W + L + 0.3S", beside
 * the tornado terms WT that are new in the 2022 edition; exact-string search, repository not named). The
 * other reading remembered, 0.5(0.3S) = 0.15S, is smaller; 0.3S is the safe one either way.
 */

export function lrfdCombinations(cases: LoadCase[] = [...LOAD_CASES], standard: LoadStandard = DEFAULT_LOAD_STANDARD): NamedCombination[] {
  const raw: { terms: Term[]; needs: LoadCase[] }[] = [];
  const v22 = standard === "ASCE 7-22";
  const companions: { t: Term; c: LoadCase }[] = [
    { t: T("Lr", 0.5), c: "Lr" },
    { t: T("S", v22 ? LRFD_SNOW_COMPANION_22 : 0.5), c: "S" },
  ];
  // (1) 1.4D
  raw.push({ terms: [T("D", 1.4)], needs: [] });
  // (2) 1.2D + 1.6L + 0.5(Lr or S or R) [7-16]; 0.3S as the snow companion [7-22, see above]
  raw.push({ terms: [T("D", 1.2), T("L", 1.6)], needs: ["L"] });
  for (const r of companions) raw.push({ terms: [T("D", 1.2), T("L", 1.6), r.t], needs: [r.c] });
  // (3) 1.2D + 1.6(Lr or S or R) + (L or 0.5W) [7-16]; 1.2D + 1.6(Lr or R) + (L or 0.5W) and 1.2D + 1.0S + (L or 0.5W) [7-22]
  for (const lead of [T("Lr", 1.6), T("S", v22 ? 1 : 1.6)]) {
    raw.push({ terms: [T("D", 1.2), lead, T("L", 1)], needs: [lead.c] });
    raw.push({ terms: [T("D", 1.2), lead, T("W", 0.5)], needs: [lead.c, "W"] });
  }
  // (4) 1.2D + 1.0W + L + 0.5(Lr or S or R) [7-16]; 0.3S as the snow companion [7-22]
  raw.push({ terms: [T("D", 1.2), T("W", 1), T("L", 1)], needs: ["W"] });
  for (const r of companions) raw.push({ terms: [T("D", 1.2), T("W", 1), T("L", 1), r.t], needs: ["W", r.c] });
  // (5) 0.9D + 1.0W
  raw.push({ terms: [T("D", 0.9), T("W", 1)], needs: ["W"] });
  return build(raw, cases);
}
