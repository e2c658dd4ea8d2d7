// Design benchmark (issue 4): `npx tsx scripts/bench.ts design` or `npm run bench`.
// (a) check one member with every ASD combination of ASCE 7-16 (the default basis) (D, L, S on a header);
// (b) size over the whole seed table (every family, plies 1–4) for a 3-span joist with pattern live load;
// (c) largest span of one joist by bisection.
import { checkMember, largestSpan, sizeMember } from "../../lib/solver/design";
import { STARTER_TABLES } from "../../lib/tables";
import { asdCombinations } from "../../lib/solver/asce7/combinations";
import { median } from "./support/stats";

// An invented header: 10 ft opening under a roof with snow and a floor above.
const headerCheck = {
  member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x12", plies: 3 },
  lengthFt: 10,
  supports: [
    { x: 0, type: "pin" },
    { x: 10, type: "roller" },
  ],
  loads: [
    { type: "area", case: "D", psf: 15, tributaryFt: 12 },
    { type: "snow", pg: 30, tributaryFt: 12 },
    { type: "area", case: "D", psf: 10, tributaryFt: 6 },
    { type: "area", case: "L", psf: 40, tributaryFt: 6 },
    { type: "point", case: "D", x: 4, P: 400 },
  ],
  bearingIn: 3,
};

// Joists continuous over three 12 ft spans (an invented floor), live load patterned span by span.
const threeSpanSize = {
  member: { material: "any" },
  lengthFt: 36,
  supports: [
    { x: 0, type: "pin" },
    { x: 12, type: "roller" },
    { x: 24, type: "roller" },
    { x: 36, type: "roller" },
  ],
  tributaryFt: 1.33,
  loads: [
    { type: "area", case: "L", psf: 40 },
    { type: "area", case: "D", psf: 10 },
  ],
  conditions: { patternLiveLoad: true },
};

const spanSearch = {
  member: { material: "sawn", species: "Hem-Fir", grade: "No.2", size: "2x10" },
  lengthFt: 14,
  supports: [
    { x: 0, type: "pin" },
    { x: 14, type: "roller" },
  ],
  spacingIn: 16,
  loads: [
    { type: "area", case: "L", psf: 40 },
    { type: "area", case: "D", psf: 10 },
  ],
  conditions: { repetitive: true, selfWeight: false },
  maxLengthFt: 30,
};

/**
 * Median seconds per call over several batches, after a warm-up: CPU time of this process
 * (process.cpuUsage), which other work on a shared machine does not inflate, and wall time.
 */
function time(fn: () => void, batches = 7, minBatchCpuMs = 150): { cpu: number; wall: number } {
  for (let i = 0; i < 3; i++) fn();
  const probe = process.cpuUsage();
  fn();
  const once = Math.max((process.cpuUsage(probe).user + process.cpuUsage(probe).system) / 2 / 1000, 0.01);
  const perBatch = Math.max(1, Math.round(minBatchCpuMs / once));
  const cpu: number[] = [];
  const wall: number[] = [];
  for (let b = 0; b < batches; b++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    for (let i = 0; i < perBatch; i++) fn();
    const c = process.cpuUsage(c0);
    wall.push((performance.now() - t0) / 1000 / perBatch);
    cpu.push((c.user + c.system) / 1e6 / perBatch);
  }
  return { cpu: median(cpu), wall: median(wall) };
}

function fmt(sec: number): string {
  return sec < 1e-3 ? `${(sec * 1e6).toFixed(1)} µs` : `${(sec * 1e3).toFixed(2)} ms`;
}

export function run(): void {
  let combos = 0;
  let candidates = 0;
  let span = 0;
  const tCheck = time(() => {
    const r = checkMember(headerCheck, STARTER_TABLES);
    combos = asdCombinations(["D", "L", "S"]).length;
    if (!r.checks.length) combos = 0;
  });
  const tSize = time(() => {
    candidates = sizeMember(threeSpanSize, STARTER_TABLES).candidates;
  });
  const tSpan = time(() => {
    span = largestSpan(spanSearch, STARTER_TABLES).largestSpan ?? 0;
  });
  const row = (name: string, t: { cpu: number; wall: number }, target: string) =>
    console.log(`  ${name.padEnd(62)} ${fmt(t.cpu).padStart(10)} CPU ${fmt(t.wall).padStart(10)} wall   ${target}`);
  console.log("design — median time per call (CPU time of this process; wall time also shown)");
  row(`(a) check: 3-ply 2x12 header, D+L+S, ${combos} ASD combinations`, tCheck, "target ≤ 2 ms");
  row(`(b) size: 3-span joist, pattern live load, ${candidates} candidates`, tSize, "target ≤ 150 ms");
  row(`(c) largest span of a 2x10 Hem-Fir No.2 at 16 in (${span} ft)`, tSpan, "");
}
