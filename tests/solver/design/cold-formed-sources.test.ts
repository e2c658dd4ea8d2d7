import { describe, expect, test } from "vitest";
import { bearingStiffenerPn, effectiveAreaUniform, effectiveSection, OMEGA_STIFFENER, PHI_STIFFENER } from "@/lib/solver/aisi/aisi-s100-16";
import { checkMember } from "@/lib/solver/design";
import { STIFFENER_FY, STIFFENER_SECTION } from "@/lib/solver/design/cold-formed";
import { findCfsSection, STARTER_TABLES } from "@/lib/tables";
import { cfsDimensions, cfsProperties } from "@/lib/tables/cold-formed";
import type { MaterialTables } from "@/lib/tables/types";
import { cfsFloor } from "../../support/cfs-floor";

// Checks of the cold-formed steel tables and provisions against published sources outside the project.

const T = STARTER_TABLES;

// ---------------------------------------------------------------------------------------------------
// Section properties against the Steel Stud Manufacturers Association's Technical Guide (2024 edition),
// structural stud/joist section property table, read in a published copy: a public repository's data
// file "SSMA Section Properties Database — Source: SSMA Technical Guide (2024 Edition)", found with the
// search tool. Rows: [section, Fy ksi, Ix in⁴, Sx in³, Ixe in⁴, Sxe in³] as that copy lists them.
const SSMA_2024: [string, number, number, number, number, number][] = [
  ["550S162-43", 33, 1.883, 0.685, 1.883, 0.681],
  ["550S162-54", 50, 2.324, 0.845, 2.324, 0.811],
  ["550S162-97", 50, 3.886, 1.413, 3.886, 1.413],
  ["550S250-54", 50, 3.126, 1.137, 3.084, 0.95],
  ["800S162-33", 33, 3.582, 0.896, 3.384, 0.71],
  ["800S162-43", 33, 4.633, 1.158, 4.5, 1.019],
  ["800S162-54", 33, 5.736, 1.434, 5.702, 1.334],
  ["800S162-54", 50, 5.736, 1.434, 5.6, 1.229],
  ["800S162-68", 50, 7.089, 1.772, 7.07, 1.663],
  ["800S162-97", 50, 9.713, 2.428, 9.713, 2.428],
  ["1000S162-43", 33, 8.025, 1.605, 7.523, 1.302],
  ["1000S162-54", 50, 9.95, 1.99, 9.391, 1.572],
  ["1000S162-68", 50, 12.325, 2.465, 11.978, 2.154],
  ["1000S162-97", 50, 16.967, 3.393, 16.967, 3.269],
  ["1200S162-54", 50, 15.73, 2.622, 14.298, 1.914],
  ["1200S162-68", 50, 19.518, 3.253, 18.39, 2.645],
  ["1200S162-97", 50, 26.966, 4.494, 26.735, 4.091],
  ["1000S200-54", 50, 11.278, 2.256, 10.769, 1.705],
  ["1200S200-68", 50, 21.947, 3.658, 20.864, 2.963],
  ["1200S250-54", 50, 19.681, 3.28, 18.433, 2.149],
];

describe("section properties against the SSMA Technical Guide (2024) property table, published copy", () => {
  test.each(SSMA_2024)("%s at %s ksi: gross Ix and Sx within 0.5 %, effective Sxe at Fy within 2 %", (name, Fy, Ix, Sx, _Ixe, Sxe) => {
    const p = cfsProperties({ ...findCfsSection(T, name), Fy });
    expect(Math.abs(p.Ix / Ix - 1)).toBeLessThan(0.005);
    expect(Math.abs(p.Sx / Sx - 1)).toBeLessThan(0.005);
    expect(Math.abs(p.Sxe / Sxe - 1)).toBeLessThan(0.02);
  });

  // The guide's Ixe is the effective I for deflection. Its notes were not read; the figures agree with
  // our effective I at the allowable-moment stress Fy/Ωb (Ωb = 1.67) within −6 % / +1 % (measured: the
  // 1-5/8 in flanges within −3 %, 1200S250-54 −6 %), and the table's own Ixe (at Fy) never exceeds them.
  test.each(SSMA_2024)("%s at %s ksi: effective I against the guide's Ixe", (name, Fy, _Ix, _Sx, Ixe) => {
    const s = { ...findCfsSection(T, name), Fy };
    const atMa = effectiveSection(cfsDimensions(s), Fy / 1.67).Ie;
    expect(atMa / Ixe).toBeGreaterThan(0.93);
    expect(atMa / Ixe).toBeLessThan(1.01);
    expect(cfsProperties(s).Ixe).toBeLessThanOrEqual(Ixe * 1.005);
  });
});

// ---------------------------------------------------------------------------------------------------
// Bearing stiffener in a C-section flexural member: Pn = 0.7(Pwc + Ae Fy) ≥ Pwc, φ = 0.90, the AISI S100
// provision as the Colombian code NSR-10 Title F adopts it (§F.4.3.3.7.2, Eq. F.4.3.3-72), read in a
// published copy (a public repository's text of that title, found with search). Limit (6): bearing at
// least 1-1/2 in. Ω = 1.70 for ASD is from memory (that copy is LRFD only).

function floor(section: string, spanFt: number, extra: Record<string, unknown> = {}) {
  return cfsFloor(section, spanFt, extra, true);
}

describe("bearing stiffener (AISI S100 provision, published copy NSR-10 Eq. F.4.3.3-72)", () => {
  test("the equation: 0.7(Pwc + Ae Fy), never below the bare web's Pwc", () => {
    expect(bearingStiffenerPn(1, 0.1, 33)).toBeCloseTo(0.7 * (1 + 3.3), 12);
    // a stiff web and a light stiffener: the bare web's strength stands
    expect(bearingStiffenerPn(10, 0.1, 33)).toBe(10);
    expect(PHI_STIFFENER).toBe(0.9);
    expect(OMEGA_STIFFENER).toBe(1.7);
  });

  test("800S162-54 with stiffeners: the end capacity is 0.7(Pwc + Ae Fy)/Ω, Pwc by Eq. G5-1 computed here", () => {
    const s = findCfsSection(T, "800S162-54");
    const { t, R, Fy } = s;
    const h = s.depth - 2 * (R + t);
    // Eq. G5-1, end one-flange, fastened: C = 4, CR = 0.14, CN = 0.35, Ch = 0.02 (Table G5-2)
    const Pwc = 4 * t * t * Fy * (1 - 0.14 * Math.sqrt(R / t)) * (1 + 0.35 * Math.sqrt(1.5 / t)) * (1 - 0.02 * Math.sqrt(h / t));
    const AeFy = effectiveAreaUniform(STIFFENER_SECTION, STIFFENER_FY) * STIFFENER_FY;
    const r = checkMember(floor("800S162-54", 14), T);
    const c = r.checks.find((x) => x.name === "web-crippling")!;
    expect(c.capacity).toBeCloseTo((Math.max(0.7 * (Pwc + AeFy), Pwc) / 1.7) * 1000, -1);
    expect(c.note).toMatch(/NSR-10 Eq\. F\.4\.3\.3-72/);
    expect(c.note).toMatch(/3 screws/);
  });

  test("a web past h/t = 200 (1000S162-43): Pwc = 0, the stiffener alone carries 0.7 Ae Fy / Ω", () => {
    const AeFy = effectiveAreaUniform(STIFFENER_SECTION, STIFFENER_FY) * STIFFENER_FY;
    const r = checkMember(floor("1000S162-43", 12), T);
    expect(r.checks.find((x) => x.name === "web-crippling")!.capacity).toBeCloseTo(((0.7 * AeFy) / 1.7) * 1000, -1);
  });

  test("on less than 1-1/2 in of bearing the stiffener is not credited, and the check says why", () => {
    const r = checkMember(floor("1000S162-43", 12, { bearingIn: 1.25 }), T);
    const c = r.checks.find((x) => x.name === "web-crippling")!;
    expect(r.pass).toBe(false);
    expect(c.capacity).toBe(0);
    expect(c.note).toMatch(/needs at least 1\.5 in of bearing/);
  });
});

// ---------------------------------------------------------------------------------------------------
// The 33 mil rows of the Prescriptive Method (1997) Table 5.4 (two continuous spans, 33 ksi, 10 psf dead,
// L/480 live, L/240 total; published copy pc-365.net/news/202010/11414.html) come out up to 18 % longer on
// AISI S100-16 with the design thickness (0.0346 in). Reproduced here: taking the thickness as the mils
// themselves (0.033 in, the minimum base-metal thickness) brings every 33 mil row checked to within
// −10 % / +7 % (−8 % before the flange roll check of §F4 was added); the rest of the gap at 24 in o.c. matches shear buckling, which governs these webs
// (h/t ≈ 225) at the interior support and which the older specification gave a larger safety factor
// (that older factor from memory). That the 1997 table used the minimum thickness is inferred from this
// reproduction, not read in it. No published copy of IRC 2021 Table R505.3.2 could be read to confirm
// 33 mil joists, so Spanlark keeps them out as bending members (thickness-scope).

const ftIn = (ft: number, inch: number) => ft + inch / 12;

function at33(thicknessFromMils: boolean): MaterialTables {
  return {
    ...T,
    coldFormed: (T.coldFormed ?? []).map((s) => {
      const b = { ...s, t: thicknessFromMils ? s.mils / 1000 : s.t, Fy: 33 };
      return { ...b, ...cfsProperties(b) };
    }),
  };
}

/** Longest equal two-span length passing every check but the thickness scope (bisection, 1/1000 ft), and the check that stops it. */
function twoSpanWith(section: string, live: number, spacing: number, tables: MaterialTables): { span: number; governing: string } {
  let lo = 2;
  let hi = 50;
  let governing = "";
  while (hi - lo > 0.001) {
    const span = (lo + hi) / 2;
    const r = checkMember(
      {
        ...floor(section, 2 * span, { spacingIn: spacing }),
        supports: [
          { x: 0, type: "pin" },
          { x: span, type: "roller" },
          { x: 2 * span, type: "roller" },
        ],
        loads: [
          { type: "area", case: "D", psf: 10 },
          { type: "area", case: "L", psf: live },
        ],
        // the table's joists have their bottom flanges braced (Prescriptive Method (1997) §5.4, gypsum board or
        // straps; see spanInput in cold-formed.test.ts for the published copies): read with the bottom edge braced
        conditions: { selfWeight: false, patternLiveLoad: false, bottomEdgeBraced: true },
      },
      tables,
    );
    const checks = r.checks.filter((c) => c.name !== "thickness-scope");
    if (checks.every((c) => c.ratio <= 1)) lo = span;
    else {
      hi = span;
      governing = checks.reduce((a, b) => (b.ratio > a.ratio ? b : a)).name;
    }
  }
  return { span: lo, governing };
}

const twoSpan = (section: string, live: number, spacing: number, tables: MaterialTables) => twoSpanWith(section, live, spacing, tables).span;

// Table 5.4 33 mil rows ("2 x 6 x 33" and "2 x 8 x 33", read as 550S162-33 and 800S162-33): [section, live psf, spacing in, span]
const ROWS_33: [string, number, number, number][] = [
  ["550S162-33", 30, 12, ftIn(12, 10)],
  ["550S162-33", 30, 24, ftIn(7, 10)],
  ["550S162-33", 40, 16, ftIn(9, 0)],
  ["550S162-33", 40, 24, ftIn(6, 7)],
  ["800S162-33", 30, 12, ftIn(12, 9)],
  ["800S162-33", 30, 24, ftIn(7, 1)],
  ["800S162-33", 40, 16, ftIn(8, 6)],
  ["800S162-33", 40, 24, ftIn(5, 8)],
];

describe("Prescriptive Method (1997) Table 5.4, 33 mil rows: the difference explained by the thickness taken", () => {
  test("design thickness: up to about 18 % longer than the table; thickness = mils: within −10 % / +7 %", () => {
    const design = at33(false);
    const minimum = at33(true);
    const byDesign = ROWS_33.map(([s, l, sp, pub]) => twoSpan(s, l, sp, design) / pub);
    const byMils = ROWS_33.map(([s, l, sp, pub]) => twoSpan(s, l, sp, minimum) / pub);
    expect(Math.max(...byDesign)).toBeGreaterThan(1.15);
    expect(Math.max(...byMils)).toBeLessThan(1.07);
    // flange roll (AISI S100-16 §F4; the 1997 table predates it) can only shorten a span: with it, the
    // shortest row comes out about 10 % under the table (it was 8 % before that check was added)
    expect(Math.min(...byMils)).toBeGreaterThan(0.9);
  }, 120_000);
});

// ---------------------------------------------------------------------------------------------------
// Every 43 to 97 mil row of the same Table 5.4 that the published copy shows and the starter tables hold
// (its "2 x 12 x 43" is outside them, h/t > 260; its "2 x 12 x 97" row is cut off in the copy), through the
// product's checks with bearing stiffeners at every support, design thickness, 33 ksi. Measured over the
// 84 rows: 0.78 to 1.02 of the table; 0.88 and up where bending, shear or deflection governs (the table
// appears to use the minimum thickness and an older specification; 1000S162-43 at 40 psf, 24 in o.c. is
// 2 % longer, within what the thickness explains), lower where the interior bearing stiffener governs.
const TABLE_5_4: [string, number[]][] = [
  ["550S162-43", [ftIn(15, 8), ftIn(13, 6), 11, 14, ftIn(12, 1), ftIn(9, 10)]],
  ["550S162-54", [ftIn(17, 7), ftIn(15, 3), ftIn(12, 5), ftIn(15, 9), ftIn(13, 8), ftIn(11, 2)]],
  ["550S162-68", [ftIn(19, 6), ftIn(17, 2), 14, ftIn(17, 8), ftIn(15, 4), ftIn(12, 6)]],
  ["550S162-97", [ftIn(21, 7), ftIn(19, 7), ftIn(16, 8), ftIn(19, 7), ftIn(17, 10), ftIn(14, 11)]],
  ["800S162-43", [ftIn(19, 5), ftIn(16, 8), ftIn(12, 6), ftIn(17, 5), ftIn(14, 3), ftIn(10, 8)]],
  ["800S162-54", [23, ftIn(19, 11), ftIn(16, 3), ftIn(20, 6), ftIn(17, 9), ftIn(14, 6)]],
  ["800S162-68", [ftIn(25, 10), ftIn(22, 5), ftIn(18, 3), ftIn(23, 2), 20, ftIn(16, 4)]],
  ["800S162-97", [ftIn(29, 4), ftIn(26, 7), ftIn(21, 11), ftIn(26, 7), 24, ftIn(19, 7)]],
  ["1000S162-43", [ftIn(20, 3), ftIn(16, 5), ftIn(12, 1), ftIn(17, 3), ftIn(13, 11), ftIn(10, 2)]],
  ["1000S162-54", [ftIn(25, 6), ftIn(22, 1), 18, ftIn(22, 10), ftIn(19, 9), ftIn(15, 6)]],
  ["1000S162-68", [ftIn(30, 6), ftIn(26, 5), ftIn(21, 7), ftIn(27, 4), ftIn(23, 8), ftIn(19, 3)]],
  ["1000S162-97", [ftIn(35, 4), ftIn(31, 9), ftIn(25, 11), ftIn(32, 1), ftIn(28, 5), ftIn(23, 2)]],
  ["1200S162-54", [ftIn(27, 8), ftIn(23, 9), ftIn(17, 10), ftIn(24, 9), ftIn(20, 4), ftIn(15, 2)]],
  ["1200S162-68", [ftIn(32, 7), ftIn(28, 3), 23, ftIn(29, 2), ftIn(25, 3), ftIn(20, 7)]],
];
const COLUMNS: [number, number][] = [
  [30, 12],
  [30, 16],
  [30, 24],
  [40, 12],
  [40, 16],
  [40, 24],
];
const ROWS_5_4 = TABLE_5_4.flatMap(([s, spans]) => spans.map((pub, i) => [s, COLUMNS[i][0], COLUMNS[i][1], pub] as [string, number, number, number]));

describe("Prescriptive Method (1997) Table 5.4, two continuous spans, every 43-97 mil row in the copy: −15 % / +5 %", () => {
  const design = at33(false);
  test.each(ROWS_5_4)("%s, %s psf live, %s in o.c.: %s ft", (section, live, spacing, published) => {
    const { span, governing } = twoSpanWith(section, live, spacing, design);
    const ratio = span / published;
    expect(ratio).toBeLessThan(1.05);
    // where the bearing stiffener over the interior support governs (a web past h/t = 200, so Pwc = 0 and
    // the 33 mil track stiffener carries 0.7 Ae Fy alone), Spanlark is shorter still: 1200S162-54 at 24 in
    // o.c. down to 0.78 of the table
    if (governing === "web-crippling") expect(ratio).toBeLessThan(1);
    else expect(ratio).toBeGreaterThan(0.85);
  });
});
