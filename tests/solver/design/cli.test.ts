import { spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import { describe, expect, test } from "vitest";

const root = fileURLToPath(new URL("../../../", import.meta.url));
const tsx = `${root}node_modules/.bin/tsx`;

function cli(command: string, input: unknown, ...flags: string[]) {
  const r = spawnSync(tsx, ["scripts/cli.ts", command, "-", ...flags], {
    cwd: root,
    input: JSON.stringify(input),
    encoding: "utf8",
    env: { ...process.env, DATABASE_URL: "" },
  });
  return { status: r.status, stdout: r.stdout, stderr: r.stderr };
}

const joist = {
  member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x10" },
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
  conditions: { repetitive: true },
};

describe("npm run check / size (JSON in, JSON out)", () => {
  test("check: exit 0 with the checks; bad input: exit 2 naming the field", () => {
    const ok = cli("check", joist);
    expect(ok.status).toBe(0);
    expect(JSON.parse(ok.stdout).checks[0].name).toBe("bending");
    const bad = cli("check", { ...joist, bearingIn: 0 });
    expect(bad.status).toBe(2);
    expect(bad.stderr).toMatch(/bearingIn: must be a number greater than 0/);
    expect(bad.stdout).toBe("");
  });

  test("size --span gives the largest span; --db without a database is refused with exit 2", () => {
    const span = cli("size", joist, "--span");
    expect(span.status).toBe(0);
    expect(JSON.parse(span.stdout).largestSpan).toBeGreaterThan(14);
    const db = cli("size", { ...joist, member: { material: "sawn", species: "Hem-Fir", grade: "No.2" } }, "--db");
    expect(db.status).toBe(2);
    expect(db.stderr).toMatch(/DATABASE_URL is not set/);
  });
});
