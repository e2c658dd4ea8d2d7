/**
 * Load take-down: the design input's loads turned into the solver's line loads by case.
 * Area loads (psf) become uniform line loads (plf) over the joist spacing or the tributary width;
 * roof snow comes from the ground snow load by Eq. 7.3-1 of the chosen ASCE 7 edition (7-16 by default).
 * Positions in ft, positive down.
 */
import { areaToLinePlf, findOccupancyPreset } from "../asce7/loads";
import { designFlatRoofSnow } from "../asce7/snow";
import { DEFAULT_LOAD_STANDARD, type LoadStandard } from "../asce7/standard";
import type { Load, LoadCase } from "../types";
import { DesignInputError } from "./errors";
import type { DesignLoad } from "./schema";

export interface TakenDownLoad {
  /** the solver load, with its case */
  load: Load & { case: LoadCase };
  /** index of the input load it came from */
  from: number;
  /** how it was derived, for the sheet, e.g. "40 psf × 16 in / 12 = 53.3 plf (IRC 2021 Table R301.5)" */
  note: string;
}

const r1 = (v: number) => Math.round(v * 10) / 10;

export function takeDown(
  loads: DesignLoad[],
  lengthFt: number,
  memberWidth: { spacingIn?: number; tributaryFt?: number },
  standard: LoadStandard = DEFAULT_LOAD_STANDARD,
): TakenDownLoad[] {
  return loads.map((l, i): TakenDownLoad => {
    const width = (l.type === "area" || l.type === "snow") && l.tributaryFt !== undefined ? { tributaryFt: l.tributaryFt } : memberWidth;
    const widthText = width.spacingIn !== undefined ? `${width.spacingIn} in / 12` : `${width.tributaryFt} ft`;
    if (l.type === "area") {
      let lc = l.case;
      let psf = l.psf;
      let source = "";
      if (l.preset !== undefined) {
        const preset = findOccupancyPreset(l.preset);
        if (!preset) throw new DesignInputError([{ path: `loads.${i}.preset`, message: `unknown preset "${l.preset}"` }]);
        lc = preset.case;
        psf = preset.psf;
        source = ` (${preset.source})`;
      }
      if (lc === undefined || psf === undefined) throw new DesignInputError([{ path: `loads.${i}`, message: "an area load needs case and psf, or a preset" }]);
      const w = areaToLinePlf(psf, width);
      return {
        load: { type: "udl", case: lc, from: l.from ?? 0, to: l.to ?? lengthFt, w },
        from: i,
        note: `${lc} ${psf} psf × ${widthText} = ${r1(w)} plf${source}`,
      };
    }
    if (l.type === "snow") {
      const snow = designFlatRoofSnow({ pg: l.pg, Ce: l.Ce, Ct: l.Ct, Is: l.Is }, standard);
      const w = areaToLinePlf(snow.ps, width);
      return {
        load: { type: "udl", case: "S", from: l.from ?? 0, to: l.to ?? lengthFt, w },
        from: i,
        note: `S: ground snow ${l.pg} psf (${standard} map) → pf = 0.7 Ce Ct Is pg = ${r1(snow.pf)} psf, pm = ${r1(snow.pm)} psf (${snow.clause}); ${r1(snow.ps)} psf × ${widthText} = ${r1(w)} plf`,
      };
    }
    return { load: l, from: i, note: `${l.case} ${l.type} as given` };
  });
}
