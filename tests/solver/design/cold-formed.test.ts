import { describe, expect, test } from "vitest";
import { checkMember, largestSpan, sizeMember } from "@/lib/solver/design";
import { DesignInputError } from "@/lib/solver/design/errors";
import { findCfsSection, STARTER_TABLES } from "@/lib/tables";
import { cfsProperties } from "@/lib/tables/cold-formed";
import type { MaterialTables } from "@/lib/tables/types";
import { cfsFloor } from "../../support/cfs-floor";

// Cold-formed steel joists and headers checked by AISI S100-16 (lib/solver/design/cold-formed.ts). The
// worked examples compute each figure here from the equations: M = wL²/8, V = R = wL/2, Δ = 5wL⁴/384EI,
// Ma = Se Fy / Ωb (§F3.1, Ωb = 1.67), Va by §G2.1 (Ωv = 1.60), web crippling Eq. G5-1 with Table G5-2
// (fastened, Ω = 1.75 at an end, 1.65 interior; read in runtosolve/AISIS100.jl's copy of the table).

const T = STARTER_TABLES;

function floor(section: string, spanFt: number, extra: Record<string, unknown> = {}) {
  return cfsFloor(section, spanFt, extra);
}

describe("800S162-54 floor joist at 16 in o.c. over 14 ft, 10 psf dead + 40 psf live (AISI S100-16, ASD, computed here)", () => {
  const s = findCfsSection(T, "800S162-54");
  const r = checkMember(floor("800S162-54", 14), T);
  const check = (name: string) => r.checks.find((c) => c.name === name)!;
  const w = ((10 + 40) * 16) / 12; // plf
  const L = 14;

  test("bending: wL²/8 against Sxe Fy / 1.67 (compression flange sheathed: Fn = Fy)", () => {
    expect(check("bending").demand).toBeCloseTo((w * L * L) / 8, 0);
    // the table's Sxe is rounded to 4 figures: 0.1 % tolerance
    expect(check("bending").capacity / (((s.Sxe * s.Fy) / 1.67) * (1000 / 12))).toBeCloseTo(1, 3);
  });

  test("shear: wL/2 against Vn / 1.60, Vn by §G2.1 with kv = 5.34", () => {
    const t = s.t;
    const h = s.depth - 2 * (s.R + t);
    const Vy = 0.6 * h * t * s.Fy;
    const Vcr = (h * t * Math.PI ** 2 * 29_500 * 5.34) / (12 * (1 - 0.09) * (h / t) ** 2);
    const lv = Math.sqrt(Vy / Vcr);
    const Vn = lv <= 0.815 ? Vy : lv <= 1.227 ? 0.815 * Math.sqrt(Vcr * Vy) : Vcr;
    expect(check("shear").demand).toBeCloseTo((w * L) / 2, 0);
    expect(check("shear").capacity).toBeCloseTo((Vn / 1.6) * 1000, -1);
  });

  test("web crippling at the ends: Eq. G5-1, end one-flange, fastened, N = 1.5 in, Ω = 1.75", () => {
    const { t, R } = s;
    const h = s.depth - 2 * (R + t);
    const Pn = 4 * t * t * s.Fy * (1 - 0.14 * Math.sqrt(R / t)) * (1 + 0.35 * Math.sqrt(1.5 / t)) * (1 - 0.02 * Math.sqrt(h / t));
    expect(check("web-crippling").demand).toBeCloseTo((w * L) / 2, 0);
    expect(check("web-crippling").capacity).toBeCloseTo((Pn / 1.75) * 1000, -1);
    // the bare web carries it: no stiffener in the answer
    expect(r.reactions.every((x) => x.bearingStiffener === false)).toBe(true);
  });

  test("deflection: 5wL⁴/384EI with E = 29,500 ksi and the effective I at the service stress (the whole section works here)", () => {
    const Ms = (w * L * L) / 8; // lb-ft
    const f = (Ms * 12) / 1000 / s.Sx; // ksi at the gross section
    expect(f).toBeLessThan(20);
    const I = s.Ix;
    const dl = (5 * ((40 * 16) / 12 / 12) * (L * 12) ** 4) / (384 * 29_500_000 * I);
    // the effective I at this stress is within 0.5 % of the gross I
    expect(check("deflection-live").demand / dl).toBeCloseTo(1, 2);
    expect(check("deflection-live").capacity).toBeCloseTo((L * 12) / 480, 3);
  });

  test("the answer reads as the trade writes it", () => {
    expect(r.pass).toBe(true);
    expect(r.answer).toMatch(/^800S162-54 at 16 in o\.c\. — /);
    expect(r.assumptions.join(" ")).toMatch(/AISI S100-16 ASD, Fy 50 ksi/);
  });

  test("LRFD: φb = 0.90 and φv = 0.95 on the same nominal strengths, against 1.2D + 1.6L", () => {
    const l = checkMember(floor("800S162-54", 14, { method: "lrfd" }), T);
    const b = l.checks.find((c) => c.name === "bending")!;
    expect(b.demand).toBeCloseTo(((((1.2 * 10 + 1.6 * 40) * 16) / 12) * (L * L)) / 8, 0);
    expect(b.capacity / (0.9 * s.Sxe * s.Fy * (1000 / 12))).toBeCloseTo(1, 3);
  });
});

describe("bearing stiffeners (AISI S100-16 §G5 and the bearing stiffener provision)", () => {
  test("a web past h/t = 200 (1000S162-43) needs a stiffener at each support; the answer says so", () => {
    const s = findCfsSection(T, "1000S162-43")!;
    expect((s.depth - 2 * (s.t + s.R)) / s.t).toBeGreaterThan(200);
    const r = checkMember(floor("1000S162-43", 12), T);
    expect(r.pass).toBe(true);
    expect(r.reactions.every((x) => x.bearingStiffener)).toBe(true);
    expect(r.answer).toMatch(/^1000S162-43 at 16 in o\.c\., bearing stiffeners at the supports — /);
    const none = checkMember(floor("1000S162-43", 12, { member: { material: "cfs", section: "1000S162-43", stiffeners: false } }), T);
    expect(none.pass).toBe(false);
    expect(none.governing).toBe("web-crippling");
    expect(none.checks.find((c) => c.name === "web-crippling")!.note).toMatch(/add a bearing stiffener/);
  });

  test("when the bare web fails and a stiffener carries it, the check says 'add a bearing stiffener' and the search adds one", () => {
    // a 43 mil joist, short and heavily loaded (storage floor), on a 1-1/2 in bearing
    const heavy = floor("800S162-43", 5, {
      member: { material: "cfs", section: "800S162-43", stiffeners: false },
      spacingIn: 24,
      loads: [
        { type: "area", case: "D", psf: 20 },
        { type: "area", case: "L", psf: 100 },
      ],
      limits: { live: 360, total: 240 },
    });
    const bare = checkMember(heavy, T);
    const crip = bare.checks.find((c) => c.name === "web-crippling")!;
    expect(crip.ratio).toBeGreaterThan(1);
    expect(crip.note).toMatch(/add a bearing stiffener/);
    const auto = checkMember({ ...heavy, member: { material: "cfs", section: "800S162-43" } }, T);
    expect(auto.checks.find((c) => c.name === "web-crippling")!.ratio).toBeLessThanOrEqual(1);
    expect(auto.answer).toMatch(/bearing stiffeners at the supports/);
  });
});

describe("continuous joists: bending with shear (§H2) and with web crippling (§H3) over the interior support", () => {
  test("two 12 ft spans: √((M/Maℓo)² + (V/Va)²) at the interior support, computed here", () => {
    const r = checkMember(
      floor("800S162-54", 24, {
        supports: [
          { x: 0, type: "pin" },
          { x: 12, type: "roller" },
          { x: 24, type: "roller" },
        ],
        conditions: { selfWeight: false, patternLiveLoad: false },
      }),
      T,
    );
    const s = findCfsSection(T, "800S162-54");
    const w = ((10 + 40) * 16) / 12;
    const M = (w * 144) / 8; // wL²/8 over the interior support of two equal spans
    const V = 0.625 * w * 12; // 5wL/8
    const mv = r.checks.find((c) => c.name === "bending-shear")!;
    const Ma = ((s.Sxe * s.Fy) / 1.67) * (1000 / 12);
    const Va = r.checks.find((c) => c.name === "shear")!.capacity;
    expect(mv.x).toBeCloseTo(12, 1);
    expect(mv.ratio).toBeCloseTo(Math.sqrt((M / Ma) ** 2 + (V / Va) ** 2), 2);
    // §H3 at the interior support, without a stiffener: 0.91 P/Pn + M/Mnℓo against 1.33/1.70
    const h3 = r.checks.find((c) => c.name === "bending-crippling")!;
    expect(h3).toBeDefined();
    expect(h3.x).toBeCloseTo(12, 1);
  });
});

describe("unbraced compression flange (§F2.1): capacity falls with the unbraced length", () => {
  test("a ceiling joist braced at 4 ft and at 8 ft", () => {
    const at = (lb: number) =>
      checkMember(floor("800S162-54", 14, { kind: "rafter", conditions: { selfWeight: false, unbracedLengthFt: lb } }), T).checks.find(
        (c) => c.name === "bending",
      )!.capacity;
    expect(at(4)).toBeLessThan(at(0));
    expect(at(8)).toBeLessThan(at(4));
  });
});

describe("headers of two C-sections", () => {
  test("a back-to-back header carries twice one C-section's moment and shear", () => {
    const one = checkMember(floor("1000S162-54", 8, { kind: "beam", spacingIn: undefined, tributaryFt: 1 }), T);
    const two = checkMember(
      floor("1000S162-54", 8, {
        kind: "header",
        spacingIn: undefined,
        tributaryFt: 1,
        member: { material: "cfs", section: "1000S162-54", assembly: "back-to-back" },
      }),
      T,
    );
    const cap = (r: typeof one, n: string) => r.checks.find((c) => c.name === n)!.capacity;
    expect(cap(two, "bending") / cap(one, "bending")).toBeCloseTo(2, 3);
    expect(cap(two, "shear") / cap(one, "shear")).toBeCloseTo(2, 2);
    expect(two.answer).toMatch(/^2-1000S162-54 back-to-back/);
  });

  test("the header search offers back-to-back and box pairs that fit the wall", () => {
    const out = sizeMember(
      {
        kind: "header",
        roughOpeningFt: 6,
        tributaryFt: 8,
        loads: [
          { type: "area", case: "D", psf: 15 },
          { type: "area", case: "L", psf: 40 },
        ],
        member: { material: "cfs" },
        limit: 10,
      },
      T,
    );
    expect(out.passing.length).toBeGreaterThan(0);
    for (const p of out.passing) expect(p.answer).toMatch(/^2-\d{3,4}S\d{3}-\d{2,3} (back-to-back|box)/);
  });
});

describe("the sizing search ranks C-joists with the other materials", () => {
  const input = {
    kind: "floor-joist",
    lengthFt: 14,
    supports: [
      { x: 0, type: "pin" },
      { x: 14, type: "roller" },
    ],
    spacingIn: 16,
    loads: [
      { type: "area", case: "D", psf: 10 },
      { type: "area", case: "L", psf: 40 },
    ],
    limits: { live: 480, total: 240 },
  };

  test("'any' includes cold-formed steel, and a C-joist answer names its stiffeners", () => {
    const out = sizeMember({ ...input, member: { material: "any" }, limit: 500 }, T);
    const cfs = out.passing.filter((p) => p.member.material === "cfs");
    expect(cfs.length).toBeGreaterThan(0);
    expect(out.passing.some((p) => p.member.material === "sawn")).toBe(true);
    for (const p of cfs) expect(p.answer).toMatch(/^\d{3,4}S\d{3}-\d{2,3} at 16 in o\.c\.(, bearing stiffeners at the supports)? — /);
  });

  test("the cfs family with one flange width only tries that width", () => {
    const out = sizeMember({ ...input, member: { material: "cfs", flanges: [1.62] }, limit: 100 }, T);
    for (const p of out.passing) expect(p.member.material === "cfs" && p.member.section.includes("S162-")).toBe(true);
  });
});

describe("bad input names the field", () => {
  test("an unknown section lists what the tables hold", () => {
    try {
      checkMember(floor("800S999-54", 14), T);
      expect.unreachable();
    } catch (err) {
      expect(err).toBeInstanceOf(DesignInputError);
      expect((err as DesignInputError).issues[0].path).toBe("member.section");
    }
  });

  test("a track is not a joist", () => {
    expect(() => checkMember(floor("800T125-54", 14), T)).toThrow(/track/);
  });

  test("an unknown assembly is refused", () => {
    expect(() => checkMember(floor("800S162-54", 14, { member: { material: "cfs", section: "800S162-54", assembly: "stacked" } }), T)).toThrow(
      DesignInputError,
    );
  });
});

// ---------------------------------------------------------------------------------------------------
// External span tables. The Prescriptive Method for Residential Cold-Formed Steel Framing, 2nd edition
// (NAHB Research Center for HUD, AISI and NAHB, 1997), read in a published copy at
// pc-365.net/news/202010/11414.html: maximum clear spans, 33 ksi steel, 10 psf dead load, L/480 live and
// L/240 total, bearing stiffeners at all supports. The table names its joists by nominal lumber size
// ("2 x 12 x 68") and refers to its Table 2.1 for the actual size, which was not read: they are taken
// here as the C-sections of that depth with 1-5/8 in flanges (1200S162-68), an assumption — verify. The
// single-span rows agreeing within 4 % supports it. Spans ft-in.
//
// IRC 2021 Table R505.3.2 (the same kind of table for today's designations, and the one the residential
// code prints) could not be read in any published copy: searched for the table title, "R505.3.2", joist
// designations (800S162-54, 1000S162-68, 1200S162-97, 550S162-33), its footnotes, AISI S230 (2007, 2015,
// 2019) floor joist tables, IRC 2012/2015/2018 editions and state or city reprints (the Ohio residential
// code, up.codes, a 2018 IRC flipbook whose stored pages stop before the table); the copies found hold the
// section's text or the standards' opening pages only. So no row of it is checked here; the 1997 table
// below is the nearest published table that could be read.

/** The starter sections re-computed at 33 ksi, as the prescriptive table assumes for every thickness. */
const T33: MaterialTables = { ...T, coldFormed: (T.coldFormed ?? []).map((s) => ({ ...s, Fy: 33, ...cfsProperties({ ...s, Fy: 33 }) })) };

const ftIn = (ft: number, inch: number) => ft + inch / 12;

// Table 5.3, single spans [section, live psf, spacing in, span]
const SINGLE: [string, number, number, number][] = [
  ["1200S162-68", 30, 12, ftIn(27, 8)],
  ["1200S162-68", 30, 16, ftIn(25, 1)],
  ["1200S162-68", 30, 24, ftIn(21, 11)],
  ["1200S162-68", 40, 12, ftIn(25, 1)],
  ["1200S162-68", 40, 16, ftIn(22, 10)],
  ["1200S162-68", 40, 24, ftIn(19, 11)],
  ["1200S162-97", 30, 12, ftIn(30, 9)],
  ["1200S162-97", 30, 16, ftIn(27, 11)],
  ["1200S162-97", 30, 24, ftIn(24, 5)],
  ["1200S162-97", 40, 12, ftIn(27, 11)],
  ["1200S162-97", 40, 16, ftIn(25, 4)],
  ["1200S162-97", 40, 24, ftIn(22, 2)],
];

function spanInput(section: string, live: number, spacing: number, spans: 1 | 2, L: number) {
  const supports =
    spans === 1
      ? [
          { x: 0, type: "pin" },
          { x: L, type: "roller" },
        ]
      : [
          { x: 0, type: "pin" },
          { x: L, type: "roller" },
          { x: 2 * L, type: "roller" },
        ];
  return {
    kind: "floor-joist",
    member: { material: "cfs", section, stiffeners: true },
    lengthFt: spans * L,
    supports,
    spacingIn: spacing,
    bearingIn: 1.5,
    loads: [
      { type: "area", case: "D", psf: 10 },
      { type: "area", case: "L", psf: live },
    ],
    limits: { live: 480, total: 240 },
    // The Prescriptive Method (1997) §5.4 "Joist Bracing" has the bottom flanges braced by a gypsum board ceiling
    // or continuous steel straps with blocking (published copies: the contents at wnwk.com/doc/3532630.html, the
    // strap wording at m.dybbs8.com/doc-1114951.html), so its two-span rows are read with the bottom edge braced
    // along its length; without that, the bottom flange over the interior support is braced only at the supports.
    conditions: { selfWeight: false, patternLiveLoad: spans === 1, bottomEdgeBraced: spans === 2 },
  };
}

function spanOf(section: string, live: number, spacing: number, spans: 1 | 2, tables: MaterialTables): number {
  const r = largestSpan({ ...spanInput(section, live, spacing, spans, 20), minLengthFt: 4, maxLengthFt: 100 }, tables);
  return (r.largestSpan ?? 0) / spans;
}

// The 1997 tables predate the distortional buckling provisions (added to AISI S100 in its 2007 edition):
// where bending governs, flange roll (§F4, no restraint credited from sheathing) now gives shorter spans.
// Each row is checked both ways: never more than 4 % longer than the table, and where it is more than 4 %
// shorter, every check but flange roll still passes at 96 % of the table's span (the old agreement), so the
// difference is the new check alone; and no more than 10 % shorter.
describe("Prescriptive Method (1997) Table 5.3, single spans, 33 ksi: within 4 %, or shorter by flange roll (§F4) alone", () => {
  test.each(SINGLE)("%s, %s psf live, %s in o.c.: %s ft", (section, live, spacing, published) => {
    const ours = spanOf(section, live, spacing, 1, T33);
    expect(ours / published).toBeLessThan(1.04);
    expect(ours / published).toBeGreaterThan(0.9);
    if (ours / published < 0.96) {
      const r = checkMember(spanInput(section, live, spacing, 1, published * 0.96), T33);
      expect(r.governing).toBe("flange-roll");
      for (const c of r.checks) if (c.name !== "flange-roll") expect(c.ratio).toBeLessThanOrEqual(1);
    }
  });
});

// Table 5.4, multiple spans (each span of two equal continuous spans; live load on both, no pattern, as the
// table's spans read). Agreement within −15 % / +5 % for 43 mil and heavier; the table's 33 mil rows are
// shorter than AISI S100-16 gives with the design thickness (by up to 18 % at 24 in): reproduced by taking
// the thickness as the mils themselves, see cold-formed-sources.test.ts.
const MULTIPLE: [string, number, number, number][] = [
  ["550S162-54", 30, 16, ftIn(15, 3)],
  ["550S162-54", 40, 24, ftIn(11, 2)],
  ["800S162-43", 30, 12, ftIn(19, 5)],
  ["800S162-43", 40, 16, ftIn(14, 3)],
  ["800S162-54", 30, 16, ftIn(19, 11)],
  ["800S162-54", 40, 16, ftIn(17, 9)],
  ["1000S162-68", 30, 16, ftIn(26, 5)],
  ["1000S162-68", 40, 24, ftIn(19, 3)],
  ["1200S162-54", 40, 16, ftIn(20, 4)],
];

describe("Prescriptive Method (1997) Table 5.4, two continuous spans, 33 ksi", () => {
  test.each(MULTIPLE)("%s, %s psf live, %s in o.c.: %s ft", (section, live, spacing, published) => {
    const ratio = spanOf(section, live, spacing, 2, T33) / published;
    expect(ratio).toBeGreaterThan(0.85);
    expect(ratio).toBeLessThan(1.05);
  });

  // 800S162-33, 40 psf, 24 in o.c. comes out about 18 % longer than the table's 5' 8" on AISI S100-16's checks
  // with the design thickness; the thickness the table appears to have used (0.033 in) brings it within 7 %
  // (cold-formed-sources.test.ts). With no readable copy of IRC 2021 Table R505.3.2 to confirm 33 mil joists,
  // Spanlark does not pass 33 mil sections at all (MIN_CHECKED_MILS in lib/solver/design/cold-formed.ts).
  test("33 mil rows, which the table gives shorter than AISI S100-16 does: no 33 mil C-joist is passed or offered", () => {
    const r = checkMember(floor("800S162-33", 5), T);
    expect(r.pass).toBe(false);
    expect(r.governing).toBe("thickness-scope");
    expect(r.checks.find((c) => c.name === "thickness-scope")!.note).toMatch(/43 mil or heavier/);
    expect(spanOf("800S162-33", 40, 24, 2, T33)).toBe(0);
    const offered = sizeMember({ ...floor("x", 5), member: { material: "cfs" }, limit: 500 }, T);
    expect(offered.passing.length).toBeGreaterThan(0);
    expect(offered.passing.every((p) => p.member.material === "cfs" && !p.member.section.endsWith("-33"))).toBe(true);
  });
});

describe("what is not checked for steel joists is said with every cold-formed answer", () => {
  test("a C-joist's check and a search that returns C-joists carry the cold-formed items; a sawn joist's does not", () => {
    const cfs = checkMember(floor("800S162-54", 14), T);
    expect(cfs.notChecked.join(" ")).toMatch(/web holes beyond the standard punchouts/);
    expect(cfs.notChecked.join(" ")).toMatch(/screws, clips/);
    expect(cfs.notChecked.join(" ")).toMatch(/bottom flange/);
    const sawn = checkMember(floor("x", 14, { member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x10" } }), T);
    expect(sawn.notChecked.join(" ")).not.toMatch(/Cold-formed/);
    const search = sizeMember({ ...floor("x", 14), member: { material: "cfs" }, limit: 3 }, T);
    expect(search.notChecked.join(" ")).toMatch(/Cold-formed steel: web holes/);
  });
});
