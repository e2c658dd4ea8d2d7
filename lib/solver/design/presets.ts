/**
 * Deflection limit presets (span/deflection). Overhangs are checked at the tip against twice their
 * length (IRC 2021 Table R301.7, note b). Every limit can be overridden by the input.
 */
import type { DeflectionPresetId } from "./schema";

export interface DeflectionPreset {
  id: DeflectionPresetId;
  label: string;
  /** live (or snow / roof live) load limit, L/n; null = not checked */
  live: number | null;
  /** total load limit, L/n; null = not checked */
  total: number | null;
  source: string;
}

export const DEFLECTION_PRESETS: readonly DeflectionPreset[] = [
  { id: "floor", label: "Floors", live: 360, total: 240, source: "IRC 2021 Table R301.7 (floors L/360); total L/240 as the span tables use it (common practice)" },
  { id: "floor-tile", label: "Floors under tile or stone", live: 480, total: 360, source: "common practice (tile and stone makers' guidance)" },
  { id: "roof-no-ceiling", label: "Rafters steeper than 3:12, no ceiling attached", live: 180, total: 120, source: "IRC 2021 Table R301.7 (L/180); total L/120 (common practice)" },
  { id: "ceiling-flexible", label: "Roofs and ceilings with flexible finishes (gypsum board)", live: 240, total: 180, source: "IRC 2021 Table R301.7 (L/240); total L/180 (common practice)" },
  { id: "ceiling-brittle", label: "Roofs and ceilings with brittle finishes (plaster, stucco)", live: 360, total: 240, source: "IRC 2021 Table R301.7 (L/360); total L/240 (common practice)" },
  { id: "other", label: "All other structural members", live: 240, total: 180, source: "IRC 2021 Table R301.7 (L/240); total L/180 (common practice)" },
];

export function deflectionPreset(id: DeflectionPresetId): DeflectionPreset {
  const preset = DEFLECTION_PRESETS.find((p) => p.id === id);
  if (!preset) throw new RangeError(`unknown deflection preset "${id}"`);
  return preset;
}

/** Limits to apply: the preset (default floors) with any number the input sets on top. */
export function resolveLimits(limits: { preset?: DeflectionPresetId; live?: number | null; total?: number | null }): { live: number | null; total: number | null; source: string } {
  const preset = deflectionPreset(limits.preset ?? "floor");
  const custom = limits.live !== undefined || limits.total !== undefined;
  return {
    live: limits.live !== undefined ? limits.live : preset.live,
    total: limits.total !== undefined ? limits.total : preset.total,
    // the row's words come first, so a roof member's note speaks of roofs and a floor's of floors
    source: custom ? `set by the user over ${preset.label.toLowerCase()} (${preset.source})` : `${preset.label}: ${preset.source}`,
  };
}
