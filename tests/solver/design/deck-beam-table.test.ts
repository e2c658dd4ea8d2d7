import { describe, expect, test } from "vitest";
import { largestSpan } from "@/lib/solver/design";
import { findSawnSize, sawnValuesForSize, sizeFactorFor, STARTER_TABLES } from "@/lib/tables";
import type { Species } from "@/lib/tables/types";

/**
 * Largest deck beam spans against the American Wood Council's Prescriptive Residential Wood Deck Construction Guide
 * (DCA 6, based on the 2015 IRC), printing 04-18 (AWC-DCA62015-DeckGuide-1804.pdf,
 * web-media.awc.org/wp-content/uploads/2022/02/17210514/AWC-DCA62015-DeckGuide-1804.pdf), p. 6, Table 3A
 * "Dimension Lumber Deck Beam Spans (LB) Supporting a Single Span of Joists with or without Overhangs". The PDF
 * itself was not read here: the figures were read in two public copies of that page, which agree cell for
 * cell on every figure below: an independent review of a copy of it, github.com/marctjones/napkin,
 * docs/code-packs/reviews/us-ct-2022/dca6-table3a.md (commit d255191c), which quotes the four notes; and
 * github.com/vbomfim/wooddeck, src/domain/spans/irc-2018-tables.ts (commit 63118a37). Earlier printings title the
 * table "Table 3. Deck Beam Spans (LB) for Joists Framing from One Side Only" (seen only as a title in search
 * excerpts); that their figures are these was not checked.
 *
 * The notes, as quoted: (1) 40 psf live, 10 psf dead, L/360 simple span beam deflection, cantilever length/180
 * deflection, No. 2 grade, wet service; (2) incising assumed for Douglas Fir-Larch, Hem-Fir and Spruce-Pine-Fir;
 * (3) design values of the northern species, not incised, for Ponderosa Pine and Red Pine; (4) beam depth at least
 * the joist depth where joists hang from it. p. 5: the beam may extend past the post face up to LB/4 (Figure 3:
 * an optional overhang at each end), and joists frame into it from one side only.
 *
 * Assumptions of this test, not printed with the table:
 * - The beam's load: the joists span LJ (the column) and overhang the beam by LJ/4, the most the guide allows, so the
 *   beam carries LJ/2 + LJ/4 = 0.75·LJ of deck. That the table assumes joists at their largest overhang is said of the
 *   IRC's copy of the table by NADRA (nadra.org/blog/nadra-code-update-7, 2019); taking half the span plus the
 *   overhang (not the joist's exact reaction, 0.78·LJ) is common practice, and the 2-ply Southern Pine rows fit it.
 * - A simple span on two posts: the beam's overhang is optional, so the table must hold without it (with one, the
 *   span's moment only drops). Spanlark measures center to center of posts; Figure 3 dimensions LB face to face
 *   (as the review reads it). The 2-ply rows fit the center-to-center span.
 * - 3-1/2 in of bearing on each post (a 4x4 post, Spanlark's deck-beam default); bearing governs no cell.
 * - No self-weight (the 10 psf dead load is taken to include it, as in the joist table).
 *
 * What is compared:
 * - Southern Pine, 2 plies: the table's own species. Within −1 in / +2 in (the table rounds down to the inch), as
 *   span-tables.test.ts and deck-joist-table.test.ts do.
 * - Southern Pine, 3 plies: NOT reproduced. Spanlark takes Cr = 1.15 for three or more plies through-nailed (NDS
 *   2018 §4.3.9, lib/solver/design/wood.ts resolveCr) and comes out 3.9 to 8.8 in LONGER than the table in all 28
 *   cells. Without Cr (repetitive: false) it is shorter than the table by up to 5.8 in (3-2x12 at 6 ft: 174.2 in
 *   against 180 in): the table's 3-ply figures lie between Spanlark's spans with and without Cr (a bending capacity
 *   about 1 to 8 % over Cr = 1.0), an assumption of the table this test could not find. One cell is shorter than
 *   both: 3-2x6 at 6 ft, printed 7'-11" (95 in), where Spanlark's bending span without Cr is 98.4 in; what governs
 *   it in the table is not known. The test asserts the bracket and the excess, so that a change to either side shows.
 *   A fit, not a reading: a model that gives a 3-ply beam about 1.05 times the bending capacity per ply of a 2-ply
 *   one lands on 48 to 52 of the 56 Southern Pine cells to the inch (e.g. the joists' exact reaction 0.78·LJ, a span
 *   2-1/2 in over LB, and Fb × 1.10 on 2 plies, × 1.15 on 3); Spanlark's ratio is 1.15 (Cr on 3 plies, not on 2).
 *   No rule for the table's ratio was found.
 * - The second row, "Douglas Fir-Larch, Hem-Fir, Spruce-Pine-Fir, Redwood, Western Cedars, Ponderosa Pine, Red
 *   Pine", prints one figure per cell for seven species, and for 2 plies the same figure as a solid 3x member
 *   ("3x8 or 2-2x8"). Its shortest species is not one Spanlark holds (Spanlark's Hem-Fir, incised and wet, comes out
 *   longer than every cell: its 2-2x12 at 6 ft is 135 in against 9'-5"), so no cell can be matched; each of
 *   Douglas Fir-Larch, Hem-Fir and Spruce-Pine-Fir must only come out no shorter than the group's figure.
 */

const SIZES = ["2x6", "2x8", "2x10", "2x12"] as const;
type Size = (typeof SIZES)[number];
const JOIST_SPANS_FT = [6, 8, 10, 12, 14, 16, 18] as const;
// allowable beam span LB (ft-in) for joist spans up to 6, 8, 10, 12, 14, 16, 18 ft
const PRINTED: Record<"Southern Pine" | "group", Record<2 | 3, Record<Size, string[]>>> = {
  "Southern Pine": {
    2: {
      "2x6": ["6-8", "5-8", "5-1", "4-7", "4-3", "4-0", "3-9"],
      "2x8": ["8-6", "7-4", "6-6", "5-11", "5-6", "5-1", "4-9"],
      "2x10": ["10-1", "8-9", "7-9", "7-1", "6-6", "6-1", "5-9"],
      "2x12": ["11-11", "10-4", "9-2", "8-4", "7-9", "7-3", "6-9"],
    },
    3: {
      "2x6": ["7-11", "7-2", "6-5", "5-10", "5-5", "5-0", "4-9"],
      "2x8": ["10-7", "9-3", "8-3", "7-6", "6-11", "6-5", "6-1"],
      "2x10": ["12-9", "11-0", "9-9", "8-9", "8-3", "7-8", "7-3"],
      "2x12": ["15-0", "13-0", "11-7", "10-6", "9-9", "9-1", "8-7"],
    },
  },
  group: {
    2: {
      "2x6": ["5-2", "4-5", "3-11", "3-7", "3-3", "2-10", "2-6"],
      "2x8": ["6-7", "5-8", "5-1", "4-7", "4-3", "3-10", "3-5"],
      "2x10": ["8-1", "7-0", "6-3", "5-8", "5-3", "4-10", "4-5"],
      "2x12": ["9-5", "8-2", "7-3", "6-7", "6-1", "5-8", "5-4"],
    },
    3: {
      "2x6": ["7-1", "6-5", "5-9", "5-3", "4-10", "4-6", "4-3"],
      "2x8": ["9-5", "8-3", "7-4", "6-8", "6-2", "5-9", "5-5"],
      "2x10": ["11-9", "10-2", "9-1", "8-3", "7-7", "7-1", "6-8"],
      "2x12": ["13-8", "11-10", "10-6", "9-7", "8-10", "8-3", "7-10"],
    },
  },
};
const ftIn = (s: string) => {
  const [ft, inch] = s.split("-").map(Number);
  return ft * 12 + inch;
};
/** the beam's share of the deck, ft: half the joist span plus the joists' overhang of a quarter of it */
const tributaryFt = (joistSpanFt: number) => joistSpanFt / 2 + joistSpanFt / 4;

function deckBeam(species: Species, size: Size, plies: 2 | 3, joistSpanFt: number, repetitive?: boolean) {
  return {
    kind: "deck-beam",
    member: { material: "sawn", species, grade: "No.2", size, plies },
    lengthFt: 10,
    supports: [
      { x: 0, type: "pin" },
      { x: 10, type: "roller" },
    ],
    tributaryFt: tributaryFt(joistSpanFt),
    loads: [
      { type: "area", case: "L", psf: 40 },
      { type: "area", case: "D", psf: 10 },
    ],
    bearingIn: 3.5,
    conditions: { wet: true, selfWeight: false, ...(repetitive === undefined ? {} : { repetitive }) },
    limits: { live: 360, total: null },
    minLengthFt: 1,
    maxLengthFt: 30,
    toleranceIn: 0.02,
  };
}

/**
 * The span from textbook formulas, in: simple span, uniform load, NDS 2018 ASD, D + L (CD 1.0); Cr 1.15 for 3 plies
 * unless told not (Spanlark's rule), 1.0 for 2; wet service CM from NDS Supplement 2018 Table 4A/4B notes (Fb 0.85
 * where Fb·CF > 1,150 psi, Fv 0.97, Fc⊥ 0.67, E 0.9); incising Ci (NDS 2018 Table 4.3.8: Fb and Fv 0.80, E 0.95,
 * Fc⊥ 1.0) for all but Southern Pine; M = wL²/8, Δ = 5wL⁴/384E′I ≤ L/360 (live), V = wL/2 (all loads),
 * R = wL/2 on 3-1/2 in of bearing across every ply (Cb 1.0).
 */
function handSpanIn(species: Species, size: Size, plies: 2 | 3, joistSpanFt: number, cr: boolean): { span: number; by: string } {
  const s = findSawnSize(STARTER_TABLES, size);
  const v = sawnValuesForSize(STARTER_TABLES, species, "No.2", size);
  const CF = sizeFactorFor(STARTER_TABLES, species, "No.2", size).CF_Fb;
  const incised = species !== "Southern Pine";
  const Cr = cr && plies >= 3 ? 1.15 : 1;
  const CMFb = v.Fb * CF <= 1150 ? 1 : 0.85;
  const Fb = v.Fb * CF * Cr * CMFb * (incised ? 0.8 : 1);
  const Fv = v.Fv * 0.97 * (incised ? 0.8 : 1);
  const E = v.E * 0.9 * (incised ? 0.95 : 1);
  const Fc = v.FcPerp * 0.67;
  const w = (50 * tributaryFt(joistSpanFt)) / 12; // lb/in
  const wL = (40 * tributaryFt(joistSpanFt)) / 12;
  const spans = {
    bending: Math.sqrt((8 * Fb * plies * s.Sx) / w),
    "deflection-live": Math.cbrt((384 * E * plies * s.Ix) / (5 * wL * 360)),
    shear: (2 * Fv * plies * s.A) / (1.5 * w),
    bearing: (2 * Fc * plies * s.b * 3.5) / w,
  };
  const [by, span] = Object.entries(spans).reduce((a, b) => (b[1] < a[1] ? b : a));
  return { span, by };
}

type Case = readonly [label: string, size: Size, joistSpanFt: number, printed: string, plies: 2 | 3];
function cases(row: "Southern Pine" | "group", plies: 2 | 3): Case[] {
  return SIZES.flatMap((size) =>
    JOIST_SPANS_FT.map((joists, i): Case => [`${plies}-${size}, joists ${joists} ft`, size, joists, PRINTED[row][plies][size][i], plies]),
  );
}

describe("largest deck beam spans against DCA 6 (2015 IRC basis) Table 3A (40 psf live, 10 psf dead, wet, No.2, L/360)", () => {
  test.each(cases("Southern Pine", 2))("Southern Pine %s: table %s", (_label, size, joists, cell) => {
    const r = largestSpan(deckBeam("Southern Pine", size, 2, joists), STARTER_TABLES);
    const ours = r.largestSpanIn ?? 0;
    const hand = handSpanIn("Southern Pine", size, 2, joists, true);
    // the same span from the textbook formulas, 0.1 in; bending governs every 2-ply cell
    expect(Math.abs(ours - hand.span)).toBeLessThan(0.1);
    expect(r.governing).toBe(hand.by);
    expect(r.governing).toBe("bending");
    // never longer than the table by the rounding or more, never shorter than it by more than an inch
    expect(ours - ftIn(cell)).toBeLessThan(2);
    expect(ours - ftIn(cell)).toBeGreaterThanOrEqual(-1);
  });

  test.each(cases("Southern Pine", 3))("Southern Pine %s: table %s (not reproduced: Cr on 3 plies)", (_label, size, joists, cell) => {
    const printed = ftIn(cell);
    const asBuilt = largestSpan(deckBeam("Southern Pine", size, 3, joists), STARTER_TABLES);
    const noCr = largestSpan(deckBeam("Southern Pine", size, 3, joists, false), STARTER_TABLES);
    const ours = asBuilt.largestSpanIn ?? 0;
    const oursNoCr = noCr.largestSpanIn ?? 0;
    for (const [r, span, cr] of [
      [asBuilt, ours, true],
      [noCr, oursNoCr, false],
    ] as const) {
      const hand = handSpanIn("Southern Pine", size, 3, joists, cr);
      expect(Math.abs(span - hand.span)).toBeLessThan(0.1);
      expect(r.governing).toBe(hand.by);
    }
    // Spanlark as built (Cr 1.15) is longer than the table beyond the tolerance in every 3-ply cell: the disagreement
    expect(ours - printed).toBeGreaterThanOrEqual(2);
    if (size === "2x6" && joists === 6) {
      // 7'-11": shorter than Spanlark's bending span even without Cr (98.4 in); the table's governing check is not known
      expect(oursNoCr - printed).toBeGreaterThan(3);
      expect(noCr.governing).toBe("bending");
    } else {
      // without Cr Spanlark is never longer than the table: the printed span lies between the two
      expect(oursNoCr - printed).toBeLessThan(2);
    }
  });

  test.each(cases("group", 2).concat(cases("group", 3)))(
    "Douglas Fir-Larch, Hem-Fir, Spruce-Pine-Fir %s: no shorter than the group's %s",
    (_label, size, joists, cell, plies) => {
      for (const species of ["Douglas Fir-Larch", "Hem-Fir", "Spruce-Pine-Fir"] as const) {
        const r = largestSpan(deckBeam(species, size, plies, joists), STARTER_TABLES);
        const ours = r.largestSpanIn ?? 0;
        const hand = handSpanIn(species, size, plies, joists, true);
        expect(Math.abs(ours - hand.span)).toBeLessThan(0.1);
        expect(r.governing).toBe(hand.by);
        // the group's figure is its weakest species' (or the solid 3x member's): each of these is at least as long
        expect(ours - ftIn(cell)).toBeGreaterThanOrEqual(-1);
      }
    },
  );

  test("Southern Pine 2-2x10 under 10 ft joists: 7'-9\" as the table prints (the 3-2x10 beside it prints 9'-9\")", () => {
    const ours = largestSpan(deckBeam("Southern Pine", "2x10", 2, 10), STARTER_TABLES).largestSpanIn ?? 0;
    expect(Math.floor(ours / 12)).toBe(7);
    expect(Math.floor(ours % 12)).toBe(9);
  });
});
