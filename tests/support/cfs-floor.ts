/**
 * A cold-formed steel floor joist check request for the solver tests: one simple span, 16 in o.c., 10 psf dead +
 * 40 psf live, 1-1/2 in bearing, self weight left out, L/480 live and L/240 total; `extra` overrides any field.
 */
export function cfsFloor(section: string, spanFt: number, extra: Record<string, unknown> = {}, stiffeners = false) {
  return {
    kind: "floor-joist",
    member: stiffeners ? { material: "cfs", section, stiffeners: true } : { material: "cfs", section },
    lengthFt: spanFt,
    supports: [
      { x: 0, type: "pin" },
      { x: spanFt, type: "roller" },
    ],
    spacingIn: 16,
    loads: [
      { type: "area", case: "D", psf: 10 },
      { type: "area", case: "L", psf: 40 },
    ],
    bearingIn: 1.5,
    conditions: { selfWeight: false },
    limits: { live: 480, total: 240 },
    ...extra,
  };
}
