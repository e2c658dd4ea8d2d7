// POST /api/solve (issue 3 contract), the route handler called directly with a Request.
import { describe, expect, test } from "vitest";
import { POST } from "@/app/api/solve/route";
import { solve } from "@/lib/solver/beam";
import type { BeamInput } from "@/lib/solver/types";

function post(body: string): Promise<Response> {
  return POST(new Request("http://localhost/api/solve", { method: "POST", headers: { "content-type": "application/json" }, body }), {
    params: Promise.resolve({}),
  });
}

const deck: BeamInput = {
  length: 16,
  E: 1_600_000,
  I: 415.3,
  supports: [
    { x: 0, type: "pin" },
    { x: 12, type: "roller" },
  ],
  loads: [
    { type: "udl", from: 0, to: 16, w: 40, case: "D" },
    { type: "udl", from: 0, to: 16, w: 160, case: "L" },
    { type: "point", x: 16, P: 250, case: "L" },
  ],
  at: [0, 6, 12, 16],
};

describe("POST /api/solve", () => {
  test("answers the same JSON as the CLI and solve(), with no sign-in", async () => {
    const res = await post(JSON.stringify(deck));
    expect(res.status).toBe(200);
    const body = (await res.json()) as ReturnType<typeof solve>;
    expect(body).toEqual(JSON.parse(JSON.stringify(solve(deck))));
    expect(body.reactions).toHaveLength(2);
    expect(body.at.map((s) => s.x)).toEqual([0, 6, 12, 16]);
    // the overhang tip: V just left of the end equals the tip load (up-positive convention: +250 lb)
    expect(body.at[3].V).toBeCloseTo(250, 9);
    expect(body.caution).toContain("licensed engineer");
    // AISC Manual 15th ed., Table 3-23 case 24: R2 = w(l+a)²/(2l) plus the tip load's P(l+a)/l
    const w = 200;
    expect(body.reactions[1].F).toBeCloseTo((w * 16 * 16) / (2 * 12) + (250 * 16) / 12, 8);
  });

  test("bad JSON: 400 invalid input", async () => {
    const res = await post("{ not json");
    expect(res.status).toBe(400);
    expect(await res.json()).toEqual({ error: "invalid input", issues: [{ path: "", message: "the body is not valid JSON" }] });
  });

  test("bad fields: 400 with each field and its reason", async () => {
    const res = await post(JSON.stringify({ ...deck, length: 300, loads: [{ type: "udl", from: 5, to: 2, w: 10 }] }));
    expect(res.status).toBe(400);
    const body = (await res.json()) as { error: string; issues: { path: string; message: string }[] };
    expect(body.error).toBe("invalid input");
    expect(body.issues).toContainEqual({ path: "length", message: "must be at most 200 ft" });
  });

  test("a layout that cannot carry load: 422 unstable with what to add", async () => {
    const res = await post(JSON.stringify({ ...deck, supports: [{ x: 4, type: "roller" }] }));
    expect(res.status).toBe(422);
    expect(await res.json()).toEqual({
      error: "unstable",
      message: "unstable: the beam can rotate about the support at x = 4 ft — add a second support or make it fixed",
    });
  });
});
