import { expect } from "vitest";
import type { BeamInput, Load, Support } from "@/lib/solver/types";

/** A Douglas fir-larch beam, E = 1,600,000 psi, I = 415.3 in^4 (a 6x12's I, dressed). */
export const E = 1_600_000;
export const I = 415.3;
/** EI in lb·ft² (the engine's internal unit); deflections from it are in ft, times 12 for in. */
export const EI = (E * I) / 144;

export function beam(length: number, supports: Support[], loads: Load[], at?: number[]): BeamInput {
  return { length, E, I, supports, loads, at };
}

export const pin = (x: number): Support => ({ x, type: "pin" });
export const roller = (x: number): Support => ({ x, type: "roller" });
export const fixed = (x: number): Support => ({ x, type: "fixed" });

/** |got − want| ≤ rel · max(|want|, scale): relative agreement, with a floor for values near 0. */
export function expectClose(got: number, want: number, rel = 1e-9, scale = 0): void {
  const tol = rel * Math.max(Math.abs(want), scale);
  if (!(Math.abs(got - want) <= tol)) {
    expect.fail(`got ${got}, want ${want} (|diff| ${Math.abs(got - want)} > ${tol})`);
  }
}
