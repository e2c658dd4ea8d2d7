import { formatFeetInches } from "@/lib/flow/length";
import type { DesignCheck } from "@/lib/solver/design/types";

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
