import type { SawnSize, SawnSizeClass } from "./types";

/**
 * Dressed (S4S, dry) sawn lumber sizes.
 *
 * Source: NDS Supplement (2018 edition), Table 1B "Section Properties of Standard Dressed (S4S)
 * Sawn Lumber". Only the dressed thickness b and depth d are data; A, Sx and Ix are computed from
 * them (see sawnSection), and tests/tables/sawn-sizes.test.ts compares the results with the values
 * Table 1B prints. Dressed dimensions are those of the American Softwood Lumber Standard
 * (PS 20): 2 in nominal dresses to 1-1/2 in, 4 in to 3-1/2 in, 5 in and thicker to 1/2 in less.
 */
const NDS_2018_TABLE_1B =
  "NDS Supplement 2018, Table 1B (A = bd, S = bd²/6, I = bd³/12 of the Table 1A dressed sizes); dressed sizes checked against the Table 1A rules in xcfem/xc (dimensional_lumber.py)";

/** Strong-axis section of a b x d rectangle: A = b·d, Sx = b·d²/6, Ix = b·d³/12 (in, in², in³, in⁴). */
export function rectangleSection(bIn: number, dIn: number): { A: number; Sx: number; Ix: number } {
  return { A: bIn * dIn, Sx: (bIn * dIn * dIn) / 6, Ix: (bIn * dIn ** 3) / 12 };
}

/**
 * One dressed size from its nominal and dressed dimensions, with A, Sx, Ix computed.
 * Example: sawnSection(2, 10, 1.5, 9.25, "dimension") gives A 13.875 in², Sx 21.39 in³, Ix 98.93 in⁴.
 */
export function sawnSection(nominalThickness: number, nominalDepth: number, bIn: number, dIn: number, sizeClass: SawnSizeClass): SawnSize {
  return {
    name: `${nominalThickness}x${nominalDepth}`,
    nominalThickness,
    nominalDepth,
    b: bIn,
    d: dIn,
    ...rectangleSection(bIn, dIn),
    sizeClass,
  };
}

/**
 * Dimension lumber is 2 in to 4 in thick. Beams and stringers (NDS 4.1.3) are 5 in and thicker
 * with a depth more than 2 in greater than the thickness. A 6x8 is a post-and-timber size by that
 * rule (lower Fb than beams and stringers), so it is left out until post-and-timber values are added.
 */
export const SAWN_SIZES: SawnSize[] = [
  // NDS Supplement 2018, Table 1B — dimension lumber
  sawnSection(2, 4, 1.5, 3.5, "dimension"),
  sawnSection(2, 6, 1.5, 5.5, "dimension"),
  sawnSection(2, 8, 1.5, 7.25, "dimension"),
  sawnSection(2, 10, 1.5, 9.25, "dimension"),
  sawnSection(2, 12, 1.5, 11.25, "dimension"),
  sawnSection(4, 6, 3.5, 5.5, "dimension"),
  sawnSection(4, 8, 3.5, 7.25, "dimension"),
  sawnSection(4, 10, 3.5, 9.25, "dimension"),
  sawnSection(4, 12, 3.5, 11.25, "dimension"),
  // NDS Supplement 2018, Table 1B — timbers 5 in and thicker (dressed 1/2 in under nominal)
  sawnSection(6, 10, 5.5, 9.5, "beams-stringers"),
  sawnSection(6, 12, 5.5, 11.5, "beams-stringers"),
];

export const SAWN_SIZES_SOURCE = NDS_2018_TABLE_1B;
