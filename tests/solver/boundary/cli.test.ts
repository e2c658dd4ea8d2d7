// `npm run --silent solve -- FILE` answers the issue 3 contract: JSON out and exit 0, or exit 2 with
// the field on standard error. Spawned as `npx tsx scripts/cli.ts solve -` with the beam on stdin.
import { spawn } from "node:child_process";
import { fileURLToPath } from "node:url";
import { describe, expect, test } from "vitest";

const root = fileURLToPath(new URL("../../../", import.meta.url));

function runCli(stdin: string): Promise<{ code: number | null; stdout: string; stderr: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn("npx", ["tsx", "scripts/cli.ts", "solve", "-"], { cwd: root, stdio: ["pipe", "pipe", "pipe"] });
    let stdout = "";
    let stderr = "";
    child.stdout.on("data", (d: Buffer) => (stdout += d.toString()));
    child.stderr.on("data", (d: Buffer) => (stderr += d.toString()));
    child.on("error", reject);
    child.on("close", (code) => resolve({ code, stdout, stderr }));
    child.stdin.end(stdin);
  });
}

// npx and tsx start slowly on a busy 2-core machine: allow each run a minute.
describe("solve CLI", { timeout: 90_000 }, () => {
  test("a 12 ft simple span under 100 plf: exit 0, reactions wl/2, M = wl²/8 at midspan (AISC Manual 15th ed., Table 3-23 case 1)", async () => {
    const beam = {
      length: 12,
      E: 1_600_000,
      I: 178,
      supports: [
        { x: 0, type: "pin" },
        { x: 12, type: "roller" },
      ],
      loads: [{ type: "udl", from: 0, to: 12, w: 100, case: "D" }],
      at: [6, 0],
    };
    const r = await runCli(JSON.stringify(beam));
    expect(r.stderr).toBe("");
    expect(r.code).toBe(0);
    const out = JSON.parse(r.stdout) as { reactions: { x: number; F: number; M: number }[]; at: { x: number; M: number; V: number }[] };
    expect(out.reactions.map((x) => x.F)).toEqual([600, 600].map((v) => expect.closeTo(v, 9)));
    expect(out.at[0].x).toBe(6);
    expect(out.at[0].M).toBeCloseTo((100 * 12 * 12) / 8, 9);
    expect(out.at[1].V).toBeCloseTo(600, 9);
  });

  test.each([
    {
      name: "a support off the member",
      body: '{"length":10,"E":1600000,"I":178,"supports":[{"x":12,"type":"pin"},{"x":0,"type":"pin"}],"loads":[]}',
      want: "supports.0.x: must be on the member, between 0 and 10 ft (got 12)",
    },
    {
      name: "a single pin",
      body: '{"length":10,"E":1600000,"I":178,"supports":[{"x":4,"type":"pin"}],"loads":[]}',
      want: "unstable: the beam can rotate about the support at x = 4 ft — add a second support or make it fixed",
    },
    { name: "not JSON", body: "{length: 10", want: "input is not valid JSON" },
  ])("$name: exit 2 and the reason on standard error", async ({ body, want }) => {
    const r = await runCli(body);
    expect(r.code).toBe(2);
    expect(r.stdout).toBe("");
    expect(r.stderr).toContain(want);
  });
});
