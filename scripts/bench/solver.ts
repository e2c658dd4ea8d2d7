// Solver benchmark (issue 3): `npx tsx scripts/bench.ts solver` or `npm run bench`.
// (a) simple span, 3 loads; (b) 4-span continuous beam, 30 loads; (c) (b) with every ASD
// combination of ASCE 7-16 (the default basis) and pattern live loading. Each analysis also evaluates 200 stations.
import { analyzeBeam, type StationArrays } from "../../lib/solver/beam";
import { asdCombinations } from "../../lib/solver/asce7/combinations";
import { envelope } from "../../lib/solver/envelope";
import type { BeamInput, Load, LoadCase } from "../../lib/solver/types";
import { median } from "./support/stats";

const STATIONS = 200;

function stations(length: number): Float64Array {
  return Float64Array.from({ length: STATIONS }, (_, i) => (length * i) / (STATIONS - 1));
}

// A 14 ft floor beam: dead and live line loads plus a post load (an invented layout).
export const caseA: BeamInput = {
  length: 14,
  E: 1_600_000,
  I: 415.3,
  supports: [
    { x: 0, type: "pin" },
    { x: 14, type: "roller" },
  ],
  loads: [
    { type: "udl", from: 0, to: 14, w: 150, case: "D" },
    { type: "udl", from: 0, to: 14, w: 400, case: "L" },
    { type: "point", x: 5.5, P: 1800, case: "L" },
  ],
};

// Joists continuous over four 12 ft spans with 30 loads of every kind (an invented layout).
function caseBLoads(): Load[] {
  const loads: Load[] = [];
  const cases: LoadCase[] = ["D", "L", "S"];
  for (let i = 0; i < 30; i++) {
    const c = cases[i % 3];
    const x = 0.7 + ((i * 1.553) % 46.5);
    switch (i % 5) {
      case 0:
        loads.push({ type: "udl", from: 0, to: 48, w: 20 + i, case: c });
        break;
      case 1:
        loads.push({ type: "point", x, P: 300 + 10 * i, case: c });
        break;
      case 2:
        loads.push({ type: "udl", from: x, to: Math.min(48, x + 5), w: 60 + i, case: c });
        break;
      case 3:
        loads.push({ type: "linear", from: x, to: Math.min(48, x + 7), w1: 10, w2: 90 + i, case: c });
        break;
      default:
        loads.push({ type: "moment", x, M: 150 - 10 * i, case: c });
    }
  }
  return loads;
}

export const caseB: BeamInput = {
  length: 48,
  E: 1_700_000,
  I: 178,
  supports: [0, 12, 24, 36, 48].map((x, i) => ({ x, type: i === 0 ? "pin" : "roller" }) as const),
  loads: caseBLoads(),
};

/** CPU time of this process in seconds: unlike wall time, other busy processes on the machine do not count. */
function cpuSeconds(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1e6;
}

/** Median CPU seconds per call, over 25 batches sized to take about 20 ms each (after a warm-up). */
function time(fn: () => void): { cpu: number; wall: number } {
  // warm up on CPU time, so that the JIT has optimized the code even on a busy machine
  const warm = cpuSeconds();
  while (cpuSeconds() - warm < 0.5) for (let i = 0; i < 50; i++) fn();
  let n = 1;
  for (;;) {
    const t0 = cpuSeconds();
    for (let i = 0; i < n; i++) fn();
    if (cpuSeconds() - t0 > 0.02) break;
    n *= 2;
  }
  const cpu: number[] = [];
  const wall: number[] = [];
  for (let b = 0; b < 25; b++) {
    const c0 = cpuSeconds();
    const w0 = performance.now();
    for (let i = 0; i < n; i++) fn();
    cpu.push((cpuSeconds() - c0) / n);
    wall.push((performance.now() - w0) / 1000 / n);
  }
  return { cpu: median(cpu), wall: median(wall) };
}

function fmt(sec: number): string {
  return sec < 1e-3 ? `${(sec * 1e6).toFixed(1)} µs` : `${(sec * 1e3).toFixed(2)} ms`;
}

export function run(): void {
  const xsA = stations(caseA.length);
  const xsB = stations(caseB.length);
  let sink = 0;
  // Stations are written into buffers allocated once, as a drawing loop would reuse them.
  const outA = analyzeBeam(caseA).evaluateMany(xsA);
  const outB = analyzeBeam(caseB).evaluateMany(xsB);
  const single = (input: BeamInput, xs: Float64Array, out: StationArrays) => () => {
    const a = analyzeBeam(input);
    const e = a.extremes;
    const s = a.spans;
    const st = a.evaluateMany(xs, out);
    sink += e.Mpos.value + s.length + st.M[100];
  };
  const combos = asdCombinations(["D", "L", "S"]);
  let runsC = 0;
  const envelopeCase = () => {
    const env = envelope(caseB, combos, { pattern: true, patternCases: ["L"] });
    runsC = env.runs.length;
    for (const r of env.runs) sink += r.analysis.evaluateMany(xsB, outB).M[100];
    sink += env.Mmax.value;
  };
  const tA = time(single(caseA, xsA, outA));
  const tB = time(single(caseB, xsB, outB));
  const tC = time(envelopeCase);
  const rows = [
    ["(a) simple span, 3 loads", tA, 1, "≤ 20 µs"],
    ["(b) 4 spans, 30 loads", tB, 1, "≤ 200 µs"],
    [`(c) (b) × ${combos.length} ASD combos × patterns = ${runsC} runs`, tC, runsC, "≤ 5 ms"],
  ] as const;
  console.log(`solver — median per analysis: reactions, extremes, spans and ${STATIONS} stations (CPU time; wall time beside it)`);
  for (const [name, t, runs, target] of rows) {
    const sps = Math.round((STATIONS * runs) / t.cpu).toLocaleString("en-US");
    console.log(`  ${name.padEnd(50)} ${fmt(t.cpu).padStart(10)}  (wall ${fmt(t.wall).padStart(9)})  ${sps.padStart(11)} stations/s   target ${target}`);
  }
  if (!Number.isFinite(sink)) console.log("(unexpected non-finite result)");
}
