/**
 * Loads the member design reads: occupancy presets (minimum uniformly distributed live loads and
 * typical dead loads, each with its source) and the take-down of area loads (psf) to line loads (plf).
 */
import type { LoadCase } from "../types";

export interface AreaLoadPreset {
  id: string;
  label: string;
  case: LoadCase;
  psf: number;
  source: string;
}

/**
 * Minimum uniformly distributed live loads for dwellings, IRC 2021 Table R301.5 (ASCE 7-22 Table 4.3-1
 * gives the same values for one- and two-family dwellings), plus a typical dead load for light framing.
 */
export const OCCUPANCY_PRESETS: readonly AreaLoadPreset[] = [
  { id: "living", label: "Rooms other than sleeping rooms", case: "L", psf: 40, source: "IRC 2021 Table R301.5" },
  { id: "sleeping", label: "Sleeping rooms", case: "L", psf: 30, source: "IRC 2021 Table R301.5" },
  { id: "deck", label: "Decks", case: "L", psf: 40, source: "IRC 2021 Table R301.5" },
  { id: "balcony", label: "Balconies (exterior) and decks", case: "L", psf: 40, source: "IRC 2021 Table R301.5" },
  { id: "stairs", label: "Stairs", case: "L", psf: 40, source: "IRC 2021 Table R301.5" },
  { id: "attic-no-storage", label: "Uninhabitable attics without storage", case: "L", psf: 10, source: "IRC 2021 Table R301.5" },
  { id: "attic-limited-storage", label: "Uninhabitable attics with limited storage", case: "L", psf: 20, source: "IRC 2021 Table R301.5" },
  { id: "attic-habitable", label: "Habitable attics served by a fixed stair", case: "L", psf: 30, source: "IRC 2021 Table R301.5" },
  { id: "roof-live", label: "Roof live load", case: "Lr", psf: 20, source: "IRC 2021 Table R301.6 (roof slope < 4:12, tributary area ≤ 200 sq ft)" },
  {
    id: "floor-dead",
    label: "Floor dead load (joists, subfloor, finish, ceiling)",
    case: "D",
    psf: 10,
    source: "IRC 2021 span tables' design dead load (common practice)",
  },
  {
    id: "floor-dead-tile",
    label: "Floor dead load with tile or stone",
    case: "D",
    psf: 20,
    source: "IRC 2021 span tables' 20 psf dead load columns (common practice)",
  },
  { id: "roof-dead", label: "Roof dead load (framing, sheathing, shingles)", case: "D", psf: 15, source: "common practice" },
];

export function findOccupancyPreset(id: string): AreaLoadPreset | undefined {
  return OCCUPANCY_PRESETS.find((p) => p.id === id);
}

/**
 * Area load to line load: w (plf) = psf × width (ft), where the width is the joist spacing
 * (in / 12) or the tributary width (ft). Example: 40 psf at 16 in → 53.33 plf.
 */
export function areaToLinePlf(psf: number, width: { spacingIn?: number; tributaryFt?: number }): number {
  if (width.spacingIn !== undefined) return (psf * width.spacingIn) / 12;
  if (width.tributaryFt !== undefined) return psf * width.tributaryFt;
  throw new RangeError("area load needs a joist spacing or a tributary width");
}
