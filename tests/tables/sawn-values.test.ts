import { describe, expect, test } from "vitest";
import { isFromMemory } from "@/lib/tables/citations";
import {
  beamsStringersCF,
  findSawnValues,
  SAWN_GRADES,
  sawnValuesForSize,
  sizeFactorFor,
  SPECIES,
  STARTER_TABLES,
  type SawnGrade,
  type Species,
} from "@/lib/tables";

const T = STARTER_TABLES;

type Values7 = [Fb: number, Ft: number, Fv: number, FcPerp: number, Fc: number, E: number, Emin: number];

// NDS Supplement 2018, Table 4A, as reproduced in xcfem/xc, python_modules/materials/awc_nds/
// dimensional_lumber.py (classes DouglasFirLarchWood, HemFirWood, SprucePineFirWood; psi, read with
// the search tool). Fb, Ft, Fv, Fc⊥, Fc, E, Emin. Exact match expected, except the one slip below.
const TABLE_4A_XCFEM: [Species, SawnGrade, Values7][] = [
  ["Douglas Fir-Larch", "Select Structural", [1500, 1000, 180, 625, 1700, 1_900_000, 690_000]],
  ["Douglas Fir-Larch", "No.1", [1000, 675, 180, 625, 1500, 1_700_000, 620_000]],
  ["Douglas Fir-Larch", "No.2", [900, 575, 180, 625, 1350, 1_600_000, 580_000]],
  ["Douglas Fir-Larch", "No.3", [525, 325, 180, 625, 775, 1_400_000, 510_000]],
  ["Hem-Fir", "Select Structural", [1400, 925, 150, 405, 1500, 1_600_000, 580_000]],
  ["Hem-Fir", "No.1", [975, 625, 150, 405, 1350, 1_500_000, 550_000]],
  ["Hem-Fir", "No.2", [850, 525, 150, 405, 1300, 1_300_000, 470_000]],
  ["Hem-Fir", "No.3", [500, 300, 150, 405, 725, 1_200_000, 440_000]],
  // xcfem/xc prints Select Structural Fb 1,150; the published copy below and a trade table say 1,250
  ["Spruce-Pine-Fir", "Select Structural", [1150, 700, 135, 425, 1400, 1_500_000, 550_000]],
  ["Spruce-Pine-Fir", "No.1", [875, 450, 135, 425, 1150, 1_400_000, 510_000]],
  ["Spruce-Pine-Fir", "No.2", [875, 450, 135, 425, 1150, 1_400_000, 510_000]],
  ["Spruce-Pine-Fir", "No.3", [500, 250, 135, 425, 650, 1_200_000, 440_000]],
];

// NDS Supplement 2018, Table 4A, as a Kotlin WoodPropertyService reproduces it ("NDS 2018 Supplement
// Table 4A"; Hem-Fir No.3 not in it). Same columns, exact match expected.
const TABLE_4A_KOTLIN: [Species, SawnGrade, Values7][] = [
  ["Douglas Fir-Larch", "Select Structural", [1500, 1000, 180, 625, 1700, 1_900_000, 690_000]],
  ["Douglas Fir-Larch", "No.1", [1000, 675, 180, 625, 1500, 1_700_000, 620_000]],
  ["Douglas Fir-Larch", "No.2", [900, 575, 180, 625, 1350, 1_600_000, 580_000]],
  ["Douglas Fir-Larch", "No.3", [525, 325, 180, 625, 775, 1_400_000, 510_000]],
  ["Hem-Fir", "Select Structural", [1400, 925, 150, 405, 1500, 1_600_000, 580_000]],
  ["Hem-Fir", "No.1", [975, 625, 150, 405, 1350, 1_500_000, 550_000]],
  ["Hem-Fir", "No.2", [850, 525, 150, 405, 1300, 1_300_000, 470_000]],
  ["Spruce-Pine-Fir", "Select Structural", [1250, 700, 135, 425, 1400, 1_500_000, 550_000]],
  ["Spruce-Pine-Fir", "No.1", [875, 450, 135, 425, 1150, 1_400_000, 510_000]],
  ["Spruce-Pine-Fir", "No.2", [875, 450, 135, 425, 1150, 1_400_000, 510_000]],
  ["Spruce-Pine-Fir", "No.3", [500, 250, 135, 425, 650, 1_200_000, 440_000]],
];

// NDS Supplement 2018, Table 4B, Southern Pine, as the same Kotlin WoodPropertyService reproduces it:
// per grade, by width band 2"–4", 5"–6", 8", 10", 12": [Fb, Ft, Fc]; Fv 175, Fc⊥ 565 throughout.
const TABLE_4B_KOTLIN: Record<SawnGrade, { E: number; Emin: number; byWidth: [number, number, number][] }> = {
  "Select Structural": {
    E: 1_800_000,
    Emin: 660_000,
    byWidth: [
      [2350, 1650, 1900],
      [2100, 1450, 1800],
      [1950, 1350, 1700],
      [1700, 1150, 1650],
      [1600, 1100, 1650],
    ],
  },
  "No.1": {
    E: 1_600_000,
    Emin: 580_000,
    byWidth: [
      [1500, 1000, 1650],
      [1350, 875, 1550],
      [1250, 800, 1500],
      [1050, 700, 1450],
      [1000, 650, 1400],
    ],
  },
  "No.2": {
    E: 1_400_000,
    Emin: 510_000,
    byWidth: [
      [1100, 675, 1450],
      [1000, 600, 1400],
      [925, 550, 1350],
      [800, 475, 1300],
      [750, 450, 1250],
    ],
  },
  "No.3": {
    E: 1_300_000,
    Emin: 470_000,
    byWidth: [
      [650, 400, 850],
      [575, 350, 800],
      [525, 325, 775],
      [475, 275, 750],
      [450, 250, 725],
    ],
  },
};
const SP_WIDTHS = [4, 6, 8, 10, 12];

// The Southern Pine Use Guide (metric edition) values xcfem/xc reproduces (dimensional_lumber.py,
// southern_pine_data), MPa / GPa, by width 38–89, 140, 184, 235, 286 mm: [Fb], [Ft], [Fc], E, Emin.
// Converted here with 1 psi = 0.006894757 MPa, each must round to the psi value (Southern Pine values
// are multiples of 25 psi, E of 100,000 psi, Emin of 10,000 psi); the metric figures carry one decimal,
// so the check is that the psi value lies within 0.05 MPa (0.05 GPa for E) of the metric one.
const SP_METRIC: Record<SawnGrade, { Fb: number[]; Ft: number[]; Fc: number[]; E: number; Emin: number }> = {
  "Select Structural": { Fb: [16.2, 14.5, 13.4, 11.7, 11.0], Ft: [11.4, 10.0, 9.3, 7.9, 7.6], Fc: [13.1, 12.4, 11.7, 11.4, 11.4], E: 12.4, Emin: 4.6 },
  "No.1": { Fb: [10.3, 9.3, 8.6, 7.2, 6.9], Ft: [6.9, 6.0, 5.5, 4.8, 4.5], Fc: [11.4, 10.7, 10.3, 10.0, 9.7], E: 11, Emin: 4 },
  "No.2": { Fb: [7.6, 6.9, 6.4, 5.5, 5.2], Ft: [4.7, 4.1, 3.8, 3.3, 3.1], Fc: [10.0, 9.7, 9.3, 9.0, 8.6], E: 9.7, Emin: 3.5 },
  "No.3": { Fb: [4.5, 4.0, 3.6, 3.3, 3.1], Ft: [2.8, 2.4, 2.2, 1.9, 1.7], Fc: [5.9, 5.5, 5.3, 5.2, 5.0], E: 9.0, Emin: 3.2 },
};
const MPA_PER_PSI = 0.006894757;

const valuesOf = (v: { Fb: number; Ft: number; Fv: number; FcPerp: number; Fc: number; E: number; Emin: number }): Values7 => [
  v.Fb,
  v.Ft,
  v.Fv,
  v.FcPerp,
  v.Fc,
  v.E,
  v.Emin,
];

describe("NDS Supplement 2018 Table 4A against two published copies", () => {
  test.each(TABLE_4A_KOTLIN)("Kotlin WoodPropertyService published copy: %s %s", (species, grade, values) => {
    const v = findSawnValues(T, species, grade, "dimension");
    expect(valuesOf(v)).toEqual(values);
    expect(v.source).toContain("NDS Supplement 2018, Table 4A");
    expect(v.source).not.toMatch(/from memory/);
  });

  test.each(TABLE_4A_XCFEM)("xcfem/xc published copy: %s %s", (species, grade, values) => {
    const v = findSawnValues(T, species, grade, "dimension");
    if (species === "Spruce-Pine-Fir" && grade === "Select Structural") {
      // the one disagreement: Spanlark follows 1,250 (the other published copy and 1,500 psi for a 2x8
      // in the JLC field guide table = 1,250 × Table 4A CF 1.2); every other value matches
      expect(v.Fb).toBe(1250);
      expect(1250 * 1.2).toBe(1500);
      expect(valuesOf(v).slice(1)).toEqual(values.slice(1));
      expect(v.source).toMatch(/1,250/);
      return;
    }
    expect(valuesOf(v)).toEqual(values);
  });
});

describe("NDS Supplement 2018 Table 4B (Southern Pine) against two published copies", () => {
  const rows = SAWN_GRADES.flatMap((grade) => SP_WIDTHS.map((depth, i) => [grade, depth, i] as const));

  test.each(rows)("Kotlin WoodPropertyService published copy: %s, %i in wide", (grade, depth, i) => {
    const { E, Emin, byWidth } = TABLE_4B_KOTLIN[grade];
    const [Fb, Ft, Fc] = byWidth[i];
    const v = findSawnValues(T, "Southern Pine", grade, "dimension", depth);
    expect(valuesOf(v)).toEqual([Fb, Ft, 175, 565, Fc, E, Emin]);
    expect(v.source).toContain("NDS Supplement 2018, Table 4B");
    expect(v.source).not.toMatch(/from memory/);
  });

  test.each(rows)("Southern Pine Use Guide (metric) in xcfem/xc: %s, %i in wide, within the metric rounding", (grade, depth, i) => {
    const m = SP_METRIC[grade];
    const v = findSawnValues(T, "Southern Pine", grade, "dimension", depth);
    for (const [psi, mpa] of [
      [v.Fb, m.Fb[i]],
      [v.Ft, m.Ft[i]],
      [v.Fc, m.Fc[i]],
    ] as const) {
      expect(Math.abs(psi * MPA_PER_PSI - mpa)).toBeLessThanOrEqual(0.05);
    }
    expect(Math.abs(v.Fv * MPA_PER_PSI - 1.2)).toBeLessThanOrEqual(0.05);
    expect(Math.abs(v.FcPerp * MPA_PER_PSI - 3.9)).toBeLessThanOrEqual(0.05);
    expect(Math.abs((v.E * MPA_PER_PSI) / 1000 - m.E)).toBeLessThanOrEqual(0.05);
    expect(Math.abs((v.Emin * MPA_PER_PSI) / 1000 - m.Emin)).toBeLessThanOrEqual(0.05);
  });
});

// NDS Supplement 2018, Table 4D, Beams and Stringers, Douglas Fir-Larch, as an open-source TypeScript
// published copy reproduces it ("Table 4D DF-L timbers (2018)", "B&S" block; read with the search tool's
// exact-string search, its repository not named by the index). Fb, Ft, Fv, Fc⊥, Fc, E, Emin; exact match.
const TABLE_4D_DFL_TS: [SawnGrade, Values7][] = [
  ["Select Structural", [1600, 950, 170, 625, 1100, 1_600_000, 580_000]],
  ["No.1", [1350, 675, 170, 625, 925, 1_600_000, 580_000]],
  ["No.2", [875, 425, 170, 625, 600, 1_300_000, 470_000]],
];

// Missouri S&T worked problem 4.17 (web.mst.edu/jthomas/classes/5260/problem/04/017, read with the
// search tool): "Nominal Design Values (psi) for No. 1 DF-L", Beams & Stringers column, in the LRFD
// format of NDS Appendix N: Fbn 3,431; Ftn 1,823; Fvn 490; Fc⊥n 1,302; Fcn 2,220; E 1,600,000; Emin-n
// 1,024,000, with KF/φ as the page lists them (Fb 2.16/0.85, Ft 2.16/0.80, Fv 2.16/0.75, Fc⊥ 1.875/0.90,
// Fc 2.16/0.90, Emin 1.5/0.85). The reference value times KF/φ must round to the printed nominal value
// (stresses to 1 psi, Emin to 1,000 psi).
const MST_DFL_NO1_BS = { Fb: 3431, Ft: 1823, Fv: 490, FcPerp: 1302, Fc: 2220, E: 1_600_000, Emin: 1_024_000 };
const KF_OVER_PHI = { Fb: 2.16 / 0.85, Ft: 2.16 / 0.8, Fv: 2.16 / 0.75, FcPerp: 1.875 / 0.9, Fc: 2.16 / 0.9, Emin: 1.5 / 0.85 };

// NDS Supplement 2018, Table 4D, Beams and Stringers, Hem-Fir Select Structural and No.1: no readable copy
// of those rows was found, so they are from memory and must say so (flagged on the admin screens and the
// job sheet's appendix).
const TABLE_4D_HF_FROM_MEMORY: [SawnGrade, Values7][] = [
  ["Select Structural", [1300, 750, 140, 405, 925, 1_300_000, 470_000]],
  ["No.1", [1050, 525, 140, 405, 750, 1_300_000, 470_000]],
];

// Missouri S&T worked problem 4.30 (web.mst.edu/jthomas/classes/5260/problem/04/030, read with the search
// tool): "ASD, No. 2 Hem-Fir", the "Timbers (Table 4D)" Beams & Stringers column: Fb 675, Ft 350, Fv 140,
// Fc⊥ 405, Fc 500 psi, E 1,100,000, Emin 400,000 psi (the page names no Supplement edition). One published
// design note (exact-string search, repository not named) also agrees on Fb 675 psi and E 1,100,000 psi.
const MST_HF_NO2_BS: Values7 = [675, 350, 140, 405, 500, 1_100_000, 400_000];

describe("NDS Supplement 2018 Table 4D, Beams and Stringers", () => {
  test.each(TABLE_4D_DFL_TS)("Douglas Fir-Larch %s against the TypeScript published copy", (grade, values) => {
    const v = findSawnValues(T, "Douglas Fir-Larch", grade, "beams-stringers");
    expect(valuesOf(v)).toEqual(values);
    expect(v.source).toContain("NDS Supplement 2018, Table 4D");
    expect(isFromMemory(v.source)).toBe(false);
  });

  test("Douglas Fir-Larch No.1 against the Missouri S&T LRFD nominal values (reference × KF/φ, rounded)", () => {
    const v = findSawnValues(T, "Douglas Fir-Larch", "No.1", "beams-stringers");
    for (const key of ["Fb", "Ft", "Fv", "FcPerp", "Fc"] as const) {
      expect(Math.abs(v[key] * KF_OVER_PHI[key] - MST_DFL_NO1_BS[key])).toBeLessThanOrEqual(0.5);
    }
    expect(v.E).toBe(MST_DFL_NO1_BS.E);
    expect(Math.abs(v.Emin * KF_OVER_PHI.Emin - MST_DFL_NO1_BS.Emin)).toBeLessThanOrEqual(500);
    expect(v.source).toMatch(/Missouri S&T/);
  });

  test.each(TABLE_4D_HF_FROM_MEMORY)("Hem-Fir %s stays flagged from memory", (grade, values) => {
    const v = findSawnValues(T, "Hem-Fir", grade, "beams-stringers");
    expect(valuesOf(v)).toEqual(values);
    expect(v.source).toContain("NDS Supplement 2018, Table 4D");
    expect(isFromMemory(v.source)).toBe(true);
  });

  test("Hem-Fir No.2 against the Missouri S&T worked problem's Beams & Stringers column, cited", () => {
    const v = findSawnValues(T, "Hem-Fir", "No.2", "beams-stringers");
    expect(valuesOf(v)).toEqual(MST_HF_NO2_BS);
    expect(v.source).toContain("NDS Supplement 2018, Table 4D");
    expect(v.source).toMatch(/Missouri S&T.*problem 4\.30/);
    expect(isFromMemory(v.source)).toBe(false);
  });
  // Specific gravity G as Tables 4A/4B print it (and NDS 2018 Table 12.3.3A): Spruce-Pine-Fir 0.42 as
  // the Kotlin published copy notes; the others from memory.
  test.each([
    ["Douglas Fir-Larch", 0.5],
    ["Hem-Fir", 0.43],
    ["Spruce-Pine-Fir", 0.42],
    ["Southern Pine", 0.55],
  ] as const)("%s G = %f", (species, G) => {
    for (const v of T.sawnValues.filter((row) => row.species === species)) expect(v.G).toBe(G);
  });

  test("every species and grade has dimension values for every dimension size", () => {
    for (const species of SPECIES) {
      for (const grade of SAWN_GRADES) {
        for (const size of T.sawnSizes.filter((s) => s.sizeClass === "dimension")) {
          expect(sawnValuesForSize(T, species, grade, size.name).species).toBe(species);
        }
      }
    }
  });
});

describe("design values against the NDS's own rules", () => {
  // NDS 2018 Appendix D, Eq. D-4: Emin = E (1 − 1.645 COV_E)(1.03)/1.66, COV_E = 0.25 for visually
  // graded sawn lumber; the Supplement prints it rounded to 10,000 psi.
  test.each(T.sawnValues.map((v) => [`${v.species} ${v.grade} ${v.sizeClass} ${v.nominalDepth ?? ""}`, v] as const))(
    "%s: Emin = E(1 − 1.645·0.25)(1.03)/1.66 rounded to 10,000 psi",
    (_, v) => {
      const emin = (v.E * (1 - 1.645 * 0.25) * 1.03) / 1.66;
      expect(Math.abs(v.Emin - emin)).toBeLessThanOrEqual(5000);
    },
  );

  // Higher grades are stronger (common practice: the grades are ordered by strength-reducing
  // characteristics): within one species, size class and width, no value rises as grade falls.
  test("no design value rises from a higher grade to a lower one", () => {
    for (const a of T.sawnValues) {
      for (const b of T.sawnValues) {
        const same = a.species === b.species && a.sizeClass === b.sizeClass && a.nominalDepth === b.nominalDepth;
        if (!same || SAWN_GRADES.indexOf(a.grade) >= SAWN_GRADES.indexOf(b.grade)) continue;
        for (const key of ["Fb", "Ft", "Fc", "E", "Emin"] as const) expect(a[key]).toBeGreaterThanOrEqual(b[key]);
      }
    }
  });

  // Table 4B: Southern Pine values fall as the width grows (the size effect is built in).
  test.each(SAWN_GRADES.map((g) => [g]))("Southern Pine %s: Fb and Ft fall with width", (grade) => {
    const rows = T.sawnValues.filter((v) => v.species === "Southern Pine" && v.grade === grade).sort((a, b) => (a.nominalDepth ?? 0) - (b.nominalDepth ?? 0));
    expect(rows.map((r) => r.nominalDepth)).toEqual([4, 6, 8, 10, 12]);
    for (let i = 1; i < rows.length; i++) {
      expect(rows[i].Fb).toBeLessThan(rows[i - 1].Fb);
      expect(rows[i].Ft).toBeLessThanOrEqual(rows[i - 1].Ft);
    }
  });
});

// NDS Supplement 2018, Table 4A "Size Factors, CF" as xcfem/xc (dimensional_lumber.py:
// fb_size_factor_y3/y4, fc_size_factor_y; Ft uses the 2"&3" Fb schedule) and a Kotlin
// ndsTable4ASizeFactor reproduce it: [size, CF for Fb, Ft, Fc]. Fb splits 2"&3" thick vs 4" thick.
const TABLE_4A_CF: [size: string, Fb: number, Ft: number, Fc: number][] = [
  ["2x4", 1.5, 1.5, 1.15],
  ["2x6", 1.3, 1.3, 1.1],
  ["2x8", 1.2, 1.2, 1.05],
  ["2x10", 1.1, 1.1, 1.0],
  ["2x12", 1.0, 1.0, 1.0],
  ["4x6", 1.3, 1.3, 1.1],
  ["4x8", 1.3, 1.2, 1.05],
  ["4x10", 1.2, 1.1, 1.0],
  ["4x12", 1.1, 1.0, 1.0],
];

describe("size factors", () => {
  test.each(
    TABLE_4A_CF.flatMap(([size, fb, ft, fc]) =>
      (["Douglas Fir-Larch", "Hem-Fir", "Spruce-Pine-Fir"] as const).flatMap((species) =>
        SAWN_GRADES.map((grade) => [species, grade, size, fb, ft, fc] as const),
      ),
    ),
  )("NDS Supp. 2018 Table 4A: %s %s %s → CF_Fb %f, CF_Ft %f, CF_Fc %f", (species, grade, size, fb, ft, fc) => {
    const cf = sizeFactorFor(T, species, grade, size);
    expect([cf.CF_Fb, cf.CF_Ft, cf.CF_Fc]).toEqual([fb, ft, fc]);
    expect(cf.table).toBe("4A");
  });

  // NDS Supplement 2018, Table 4B footnote, as a Kotlin resolveSawnCf reproduces its notes: size is
  // already in the values, except Fb × 1.1 "permitted" for 4" thick lumber 8" and wider.
  test.each([
    ["2x4", 1.0],
    ["2x10", 1.0],
    ["2x12", 1.0],
    ["4x6", 1.0],
    ["4x8", 1.1],
    ["4x10", 1.1],
    ["4x12", 1.1],
  ] as const)("NDS Supp. 2018 Table 4B: Southern Pine No.2 %s → CF_Fb %f, CF_Ft = CF_Fc = 1", (size, fb) => {
    const cf = sizeFactorFor(T, "Southern Pine", "No.2", size);
    expect([cf.CF_Fb, cf.CF_Ft, cf.CF_Fc]).toEqual([fb, 1.0, 1.0]);
    expect(cf.table).toBe("4B");
  });

  // NDS Supplement 2018, Table 4D: CF = (12/d)^(1/9) for d > 12 in (as several open-source NDS codes
  // reproduce it), computed here from the rule.
  test.each([
    [7.5, 1.0],
    [11.5, 1.0],
    [12, 1.0],
    [13.5, Math.pow(12 / 13.5, 1 / 9)],
    [15.5, Math.pow(12 / 15.5, 1 / 9)],
    [23.5, Math.pow(12 / 23.5, 1 / 9)],
  ])("NDS Supp. 2018 Table 4D: d = %f in → CF = %f", (d, expected) => {
    expect(beamsStringersCF(d)).toBeCloseTo(expected, 12);
  });

  test.each(["6x10", "6x12"])("beams and stringers %s take the Table 4D factor", (size) => {
    const cf = sizeFactorFor(T, "Douglas Fir-Larch", "No.1", size);
    expect(cf.table).toBe("4D");
    expect(cf.CF_Fb).toBe(1.0);
  });
});
