/**
 * Deflection limit presets (span/deflection) and where each number comes from.
 *
 * Live-load limits: IRC 2021 Table R301.7 (floors L/360; ceilings with plaster or stucco L/360;
 * ceilings with gypsum board or other flexible finishes L/240; rafters steeper than 3:12 with no
 * finished ceiling L/180; all other structural members L/240), as reproduced on a public page of the
 * table (scribd, "IRC Table R301.7"). IRC R301.7 has no total-load column.
 * Total-load limits: IBC 2021 Table 1604.3, column D + L (roof members supporting plaster or stucco
 * l/240, nonplaster ceiling l/180, not supporting a ceiling l/120; floor members l/240), as reproduced
 * on up.codes ("1604.3 Serviceability"). Footnote d of that table (the D + L limit applies to the creep
 * part of dead-load deflection plus live load; for dry wood, 0.5D + L) is NOT applied: Spanlark checks
 * the immediate D + L deflection against it, which is larger, so the check is the conservative one.
 * Overhangs are checked at the tip against twice their length (IRC 2021 Table R301.7 note b;
 * IBC 2021 Table 1604.3 note h). Every limit can be overridden by the input.
 */
import type { DeflectionPresetId } from "./schema";

export interface DeflectionPreset {
  id: DeflectionPresetId;
  label: string;
  /** live (or snow / roof live) load limit, L/n; null = not checked */
  live: number | null;
  /** total load limit, L/n; null = not checked */
  total: number | null;
  /** where both numbers come from, with the footnote applied or not */
  source: string;
}

const IBC_TOTAL = "IBC 2021 Table 1604.3, D + L column (footnote d not applied: immediate D + L deflection checked, the conservative reading)";

export const DEFLECTION_PRESETS: readonly DeflectionPreset[] = [
  { id: "floor", label: "Floors", live: 360, total: 240, source: `live L/360: IRC 2021 Table R301.7 (floors); total L/240: ${IBC_TOTAL}, floor members` },
  {
    id: "floor-tile",
    label: "Floors under tile or stone",
    live: 480,
    total: 360,
    source: "live L/480 and total L/360: common practice (tile and stone makers' guidance), stiffer than IRC 2021 Table R301.7 and IBC 2021 Table 1604.3",
  },
  {
    id: "roof-no-ceiling",
    label: "Rafters steeper than 3:12, no ceiling attached",
    live: 180,
    total: 120,
    source: `live L/180: IRC 2021 Table R301.7 (rafters over 3:12, no finished ceiling); total L/120: ${IBC_TOTAL}, roof members not supporting a ceiling`,
  },
  {
    id: "ceiling-flexible",
    label: "Roofs and ceilings with flexible finishes (gypsum board)",
    live: 240,
    total: 180,
    source: `live L/240: IRC 2021 Table R301.7 (ceilings with gypsum board or other flexible finishes); total L/180: ${IBC_TOTAL}, roof members supporting a nonplaster ceiling`,
  },
  {
    id: "ceiling-brittle",
    label: "Roofs and ceilings with brittle finishes (plaster, stucco)",
    live: 360,
    total: 240,
    source: `live L/360: IRC 2021 Table R301.7 (ceilings with plaster or stucco); total L/240: ${IBC_TOTAL}, roof members supporting plaster or stucco`,
  },
  {
    id: "other",
    label: "All other structural members",
    live: 240,
    total: 180,
    source: `live L/240: IRC 2021 Table R301.7 (all other structural members); total L/180: ${IBC_TOTAL}, taken as for roof members with a nonplaster ceiling (the table has no row for other members)`,
  },
];

export function deflectionPreset(id: DeflectionPresetId): DeflectionPreset {
  const preset = DEFLECTION_PRESETS.find((p) => p.id === id);
  if (!preset) throw new RangeError(`unknown deflection preset "${id}"`);
  return preset;
}

/** Limits to apply: the preset (default floors) with any number the input sets on top. */
export function resolveLimits(limits: { preset?: DeflectionPresetId; live?: number | null; total?: number | null }): {
  live: number | null;
  total: number | null;
  source: string;
} {
  const preset = deflectionPreset(limits.preset ?? "floor");
  const custom = limits.live !== undefined || limits.total !== undefined;
  return {
    live: limits.live !== undefined ? limits.live : preset.live,
    total: limits.total !== undefined ? limits.total : preset.total,
    // the row's words come first, so a roof member's note speaks of roofs and a floor's of floors
    source: custom ? `set by the user over ${preset.label.toLowerCase()} (${preset.source})` : `${preset.label}: ${preset.source}`,
  };
}
