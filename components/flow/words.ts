import { formatFeetInches } from "@/lib/flow/length";
import type { DesignCheck } from "@/lib/solver/design/types";

const TITLES: Record<string, string> = {
  bending: "Bending",
  shear: "Shear",
  "deflection-live": "Deflection, live load",
  "deflection-total": "Deflection, total load",
  bearing: "Bearing on the supports",
  stability: "Sideways buckling",
  "web-yielding": "Web yielding",
  "web-crippling": "Web crippling",
  "web-compactness": "Web compactness",
  "bending-crippling": "Bending with web crippling",
  "bending-shear": "Bending with shear",
  "flange-roll": "Flange roll (distortional buckling, AISI S100-16 §F4)",
  "thickness-scope": "Steel thickness outside the checked range",
};

/** The check's plain name. */
export function checkTitle(name: string | null): string {
  if (name === null) return "—";
  return TITLES[name] ?? name;
}

function fig(v: number): string {
  return Math.abs(v) >= 100 ? Math.round(v).toLocaleString("en-US") : String(Math.round(v * 100) / 100);
}

/** "1,210 of 1,476 psi, D+L, at 6' 0"" */
export function checkDetail(c: Pick<DesignCheck, "demand" | "capacity" | "unit" | "combination" | "x">): string {
  const parts = [`${fig(c.demand)} of ${fig(c.capacity)} ${c.unit}`];
  if (c.combination) parts.push(c.combination.name);
  if (c.x !== null) parts.push(`at ${formatFeetInches(c.x)}`);
  return parts.join(", ");
}
