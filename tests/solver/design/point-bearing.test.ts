import { describe, expect, test } from "vitest";
import { answerFacts } from "@/lib/flow/summary";
import { checkMember } from "@/lib/solver/design/check";
import { findWShape, STARTER_TABLES } from "@/lib/tables";
import { NOT_CHECKED } from "@/lib/caution";

// Bearing under a point load on the member (a post or beam bearing on it), worked by hand from the published
// rules: NDS 2018 §3.10.2 (fc⊥ = P / Ab ≤ Fc⊥′; Cb = 1.0 taken, the §3.10.4 increase needs the bearing's
// length) with DF-L No.2 Fc⊥ = 625 psi (NDS Supplement 2018 Table 4A, as tests/solver/design/nds-2018.test.ts
// checks it) and CM = 0.67 wet (NDS Supplement Table 4A footnote, as that test checks it); AISC 360-16 §J10.2
// away from the end, Rn = Fy tw (5k + lb), Ω = 1.50, and §J10.3 at d/2 or more from the end,
// Rn = 0.80 tw² [1 + 3 (lb/d)(tw/tf)^1.5] √(E Fy tf / tw), Ω = 2.00. The loads are combined by ASCE 7-16 §2.4.1.

const T = STARTER_TABLES;

function beam(member: Record<string, unknown>, loads: Record<string, unknown>[], extra: Record<string, unknown> = {}) {
  return {
    member,
    lengthFt: 12,
    supports: [
      { x: 0, type: "pin" },
      { x: 12, type: "roller" },
    ],
    loads,
    bearingIn: 3,
    conditions: { selfWeight: false },
    limits: { live: 360, total: 240 },
    ...extra,
  };
}

const post = [
  { type: "point", case: "D", x: 5, P: 1500 },
  { type: "point", case: "L", x: 5, P: 3000 },
];

describe("a wood beam with a post bearing on it at 5 ft (D 1,500 lb + L 3,000 lb)", () => {
  const r = checkMember(beam({ material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x10", plies: 3 }, post), T);

  test("the load is D+L = 4,500 lb; Fc⊥′ = 625 psi dry; area 4,500 / 625 = 7.2 in², a 4x4 post's end is enough", () => {
    expect(r.pointBearing).toHaveLength(1);
    const b = r.pointBearing![0];
    expect(b.P).toBeCloseTo(4500, 6);
    expect(b.combination).toBe("D+L");
    expect(b.FcPerpPrime).toBeCloseTo(625, 6);
    expect(b.areaIn2).toBeCloseTo(4500 / 625, 6);
    expect(b.widthIn).toBeCloseTo(4.5, 6);
    expect(b.lengthIn).toBeCloseTo(4500 / 625 / 4.5, 6);
    // a 4x4's end on a 4.5 in wide beam bears 3.5 × 3.5 = 12.25 in²; a 6x6's 4.5 × 5.5 = 24.75 in² (the beam is narrower than the post)
    expect(b.words).toBe(
      "the point load at 5 ft 0 in (4,500 lb, D+L) needs 7.2 in² of contact on this member (a 4x4 post's end gives 12.2 in²; a 6x6 post's end gives 24.7 in²), Fc⊥′ = 625 psi, NDS 2018 §3.10.2, Cb = 1.0; the post or beam bearing on it is not checked",
    );
  });

  test("the answer, crew link and sheet read it among the facts; the not-checked list names what bears on it", () => {
    expect(answerFacts(r)).toContain(`Bearing: ${r.pointBearing![0].words}`);
    expect(NOT_CHECKED.some((n) => /bears on this member at a point load/.test(n))).toBe(true);
  });

  test("wet service: Fc⊥′ = 625 × 0.67 = 418.75 psi, so 4,500 lb needs 10.75 in²", () => {
    const wet = checkMember(
      beam({ material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x10", plies: 3 }, post, {
        conditions: { selfWeight: false, wet: true, incised: false },
      }),
      T,
    );
    expect(wet.pointBearing![0].FcPerpPrime).toBeCloseTo(625 * 0.67, 6);
    expect(wet.pointBearing![0].areaIn2).toBeCloseTo(4500 / (625 * 0.67), 6);
    expect(wet.pointBearing![0].words).toMatch(/needs 10\.8 in² of contact on this member \(a 4x4 post's end gives 12\.2 in²; a 6x6/);
  });

  test("a heavy load on a narrow beam: a 4x4 post's end is too little", () => {
    const heavy = checkMember(
      beam({ material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x12", plies: 2 }, [{ type: "point", case: "D", x: 6, P: 7000 }], {
        limits: { live: null, total: null },
      }),
      T,
    );
    // 7,000 / 625 = 11.2 in²; a 4x4 on a 3 in wide beam bears 3 × 3.5 = 10.5 in² (too little), a 6x6 3 × 5.5 = 16.5 in²
    expect(heavy.pointBearing![0].words).toMatch(
      /needs 11\.2 in² of contact on this member \(a 4x4 post's end gives 10\.5 in², too little; a 6x6 post's end gives 16\.5 in²\)/,
    );
  });

  test("an upward point load bears nothing; two places are two lines", () => {
    const two = checkMember(
      beam({ material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x10", plies: 3 }, [
        ...post,
        { type: "point", case: "D", x: 9, P: 800 },
        { type: "point", case: "W", x: 3, P: -500 },
      ]),
      T,
    );
    expect(two.pointBearing!.map((b) => [b.x, Math.round(b.P)])).toEqual([
      [5, 4500],
      [9, 800],
    ]);
  });

  test("no point load, no line", () => {
    const none = checkMember(
      beam({ material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x10", plies: 3 }, [{ type: "udl", case: "D", from: 0, to: 12, w: 100 }]),
      T,
    );
    expect(none.pointBearing).toEqual([]);
  });
});

describe("a W8x18 with a column bearing on it at mid-span (D 8 kips + L 12 kips)", () => {
  const Fy = 50;
  const s = findWShape(T, "W8x18");
  const loads = [
    { type: "point", case: "D", x: 6, P: 8000 },
    { type: "point", case: "L", x: 6, P: 12000 },
  ];
  const r = checkMember(beam({ material: "steel", shape: "W8x18", grade: "A992" }, loads), T);

  test("bearing needed along the flange: the longer of J10.2 and J10.3 away from the end, worked here", () => {
    const R = 20; // kips, D+L
    // J10.2 interior: Rn = Fy tw (5k + lb), Ω = 1.50 → lb = 1.5 R / (Fy tw) − 5k
    const lbYield = Math.max((1.5 * R) / (Fy * s.tw) - 5 * s.kdes, 0);
    // J10.3 interior: Rn = 0.80 tw² [1 + 3 (lb/d)(tw/tf)^1.5] √(E Fy tf / tw), Ω = 2.00
    const root = Math.sqrt((29000 * Fy * s.tf) / s.tw);
    const lbCripple = Math.max((((2 * R) / (0.8 * s.tw ** 2 * root) - 1) / (3 * (s.tw / s.tf) ** 1.5)) * s.d, 0);
    const b = r.pointBearing![0];
    expect(b.P).toBeCloseTo(20000, 6);
    expect(b.lengthIn).toBeCloseTo(Math.max(lbYield, lbCripple), 1);
    expect(b.areaIn2).toBeNull();
    expect(b.words).toMatch(/^the point load at 6 ft 0 in \(20,000 lb, D\+L\)/);
  });

  test("a load the web cannot take at any bearing length up to 48 in asks for stiffeners", () => {
    const heavy = checkMember(
      beam({ material: "steel", shape: "W8x18", grade: "A992" }, [{ type: "point", case: "D", x: 6, P: 400000 }], { limits: { live: null, total: null } }),
      T,
    );
    expect(heavy.pointBearing![0].lengthIn).toBeNull();
    expect(heavy.pointBearing![0].words).toMatch(/needs web stiffeners under it/);
  });
});

describe("an I-joist under a point load", () => {
  test("the answer names the load and asks for web stiffeners, blocking or a beam under it, as the maker's guide does", () => {
    const r = checkMember(
      {
        member: { material: "ijoist", joist: "PRI-40 11-7/8" },
        lengthFt: 14,
        supports: [
          { x: 0, type: "pin" },
          { x: 14, type: "roller" },
        ],
        spacingIn: 16,
        loads: [
          { type: "area", case: "L", psf: 40 },
          { type: "area", case: "D", psf: 15 },
          { type: "point", case: "D", x: 7, P: 300 },
        ],
        bearingIn: 1.75,
        conditions: { selfWeight: false },
        limits: { live: 360, total: 240 },
      },
      T,
    );
    expect(r.pointBearing).toHaveLength(1);
    expect(r.pointBearing![0]).toMatchObject({ on: "ijoist", x: 7, P: 300, areaIn2: null, lengthIn: null });
    expect(answerFacts(r).join("\n")).toMatch(
      /Bearing: the point load at 7 ft 0 in \(300 lb, D\) bears on the I-joist's top flange: web stiffeners under it, or blocking or a beam that carries it/,
    );
  });
});
