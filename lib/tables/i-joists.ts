import type { IJoist } from "./types";

/**
 * Prefabricated wood I-joists by the generic designations of APA's performance standard PRI-400
 * (APA EWS Performance Rated I-Joists, design properties as APA Form Z725 publishes them): allowable
 * moment, shear, intermediate and end reactions (with and without web stiffeners), EI and the shear
 * deflection coefficient K, ASD, normal load duration, dry service. These are not one maker's product:
 * every APA EWS member mill's PRI joists meet them. A maker's own joist series carries its own values
 * (the admin can add them as rows).
 *
 * Checked value by value against the ASD design properties xcfem/xc reproduces in SI units
 * (python_modules/materials/awc_nds/aux/pr_400_i_joists.json, from its spreadsheet
 * asd_design_properties_apa_ews_performance_rated_i_joists), converted back here: every figure comes
 * back a round lbf, lbf-ft or 10⁶ lbf-in² value. PRI-40 9-1/2 (EI 184 × 10⁶ lbf-in², K 4.94 × 10⁶ lbf)
 * also matches the values a published worked example reads from ICC-ES ESR-1405. tests/tables/i-joists.test.ts
 * holds the SI figures and the conversion.
 *
 * The weight is Spanlark's allowance for the joist's own weight, not a table value: 3 plf for
 * 9-1/2 and 11-7/8 in joists, 4 plf for 14 and 16 in, on the heavy side of what the joists weigh.
 */
const PRI_400 =
  "APA PRI-400 design properties (APA Form Z725); checked against the SI published copy in xcfem/xc (awc_nds/aux/pr_400_i_joists.json); weight is an allowance";

/** [series, depth in, flange width in, EI 10⁶ lbf-in², M lbf-ft, V lbf, IR lbf, ER 1-3/4 in, ER 1-3/4 in stiffened, ER 4 in, ER 4 in stiffened, K 10⁶ lbf] */
type Row = [string, number, number, number, number, number, number, number, number, number, number, number];

const ROWS: Row[] = [
  ["PRI-20", 9.5, 1.5, 132, 2520, 1120, 1700, 830, 830, 1120, 1120, 4.94],
  ["PRI-30", 9.5, 1.5, 159, 3225, 1120, 1905, 945, 945, 1120, 1120, 4.94],
  ["PRI-40", 9.5, 2.5, 184, 2735, 1120, 2160, 1080, 1080, 1120, 1120, 4.94],
  ["PRI-50", 9.5, 1.75, 186, 3800, 1120, 2040, 1015, 1015, 1120, 1120, 4.94],
  ["PRI-60", 9.5, 2.5, 219, 3780, 1120, 2160, 1080, 1080, 1120, 1120, 4.94],
  ["PRI-20", 11.875, 1.5, 225, 3265, 1420, 1700, 830, 830, 1420, 1420, 6.18],
  ["PRI-30", 11.875, 1.5, 271, 4170, 1420, 1905, 945, 945, 1420, 1420, 6.18],
  ["PRI-40", 11.875, 2.5, 313, 3545, 1420, 2500, 1200, 1200, 1420, 1420, 6.18],
  ["PRI-50", 11.875, 1.75, 316, 4915, 1420, 2040, 1015, 1015, 1420, 1420, 6.18],
  ["PRI-60", 11.875, 2.5, 371, 4900, 1420, 2500, 1200, 1200, 1420, 1420, 6.18],
  ["PRI-70", 11.875, 2.3125, 416, 6595, 1420, 2335, 1160, 1160, 1420, 1420, 6.18],
  ["PRI-80", 11.875, 3.5, 518, 6940, 1420, 2760, 1280, 1280, 1420, 1420, 6.18],
  ["PRI-90", 11.875, 3.5, 571, 8770, 1925, 3355, 1400, 1400, 1885, 1925, 6.18],
  ["PRI-40", 14, 2.5, 459, 4270, 1710, 2500, 1200, 1200, 1550, 1710, 7.28],
  ["PRI-50", 14, 1.75, 463, 5860, 1710, 2040, 1015, 1015, 1550, 1710, 7.28],
  ["PRI-60", 14, 2.5, 544, 5895, 1710, 2500, 1200, 1200, 1550, 1710, 7.28],
  ["PRI-70", 14, 2.3125, 609, 7865, 1710, 2335, 1160, 1160, 1550, 1710, 7.28],
  ["PRI-80", 14, 3.5, 756, 8360, 1710, 3020, 1280, 1280, 1550, 1710, 7.28],
  ["PRI-90", 14, 3.5, 832, 10460, 2125, 3355, 1400, 1400, 1885, 2125, 7.28],
  ["PRI-40", 16, 2.5, 625, 4950, 1970, 2500, 1200, 1200, 1550, 1970, 8.32],
  ["PRI-50", 16, 1.75, 630, 6715, 1970, 2040, 1015, 1015, 1550, 1970, 8.32],
  ["PRI-60", 16, 2.5, 739, 6835, 1970, 2500, 1200, 1200, 1550, 1970, 8.32],
  ["PRI-70", 16, 2.3125, 826, 9010, 1970, 2335, 1160, 1160, 1550, 1970, 8.32],
  ["PRI-80", 16, 3.5, 1024, 9690, 1970, 3020, 1280, 1280, 1550, 1970, 8.32],
  ["PRI-90", 16, 3.5, 1126, 11985, 2330, 3355, 1400, 1400, 1885, 2330, 8.32],
];

/** 9.5 → "9-1/2", 11.875 → "11-7/8", 14 → "14" */
export function depthWords(dIn: number): string {
  const whole = Math.floor(dIn + 1e-9);
  const eighths = Math.round((dIn - whole) * 8);
  if (eighths === 0) return String(whole);
  const g = eighths % 2 === 0 ? (eighths % 4 === 0 ? 4 : 2) : 1;
  return `${whole}-${eighths / g}/${8 / g}`;
}

export const I_JOISTS: IJoist[] = ROWS.map(([series, d, flangeWidth, EI6, M, V, IR, ER175, ER175Stiffened, ER4, ER4Stiffened, K6]) => ({
  name: `${series} ${depthWords(d)}`,
  series,
  d,
  flangeWidth,
  EI: EI6 * 1e6,
  M,
  V,
  IR,
  ER175,
  ER175Stiffened,
  ER4,
  ER4Stiffened,
  K: K6 * 1e6,
  weightPlf: d <= 12 ? 3 : 4,
  source: PRI_400,
}));
