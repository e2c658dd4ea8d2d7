import { describe, expect, test } from "vitest";
import { POST } from "@/app/api/size/route";

const post = (body: unknown, query = "") =>
  POST(new Request(`http://localhost/api/size${query}`, { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify(body) }), {
    params: Promise.resolve({}),
  });

const header = {
  member: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2" },
  lengthFt: 8,
  supports: [
    { x: 0, type: "pin" },
    { x: 8, type: "roller" },
  ],
  tributaryFt: 6,
  loads: [
    { type: "area", case: "D", psf: 15 },
    { type: "area", case: "L", psf: 40 },
  ],
  bearingIn: 3,
};

describe("POST /api/size", () => {
  test("ranks the passing members best first, with the nearest failures and why", async () => {
    const res = await post({ ...header, rank: "depth" });
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.passing.length).toBeGreaterThan(0);
    for (let i = 1; i < body.passing.length; i++) expect(body.passing[i].depth).toBeGreaterThanOrEqual(body.passing[i - 1].depth);
    for (const p of body.passing) {
      expect(p.ratio).toBeLessThanOrEqual(1);
      expect(p).toEqual(expect.objectContaining({ member: expect.any(Object), governing: expect.any(String) }));
    }
    for (const f of body.failing) {
      expect(f.ratio).toBeGreaterThan(1);
      expect(f.reason).toMatch(/%/);
    }
  });

  test("ranks by the table's cost column", async () => {
    const body = await (await post({ ...header, member: { material: "any" }, rank: "cost" })).json();
    const costs = body.passing.map((p: { costPerFoot: number | null }) => p.costPerFoot ?? Infinity);
    for (let i = 1; i < costs.length; i++) expect(costs[i]).toBeGreaterThanOrEqual(costs[i - 1]);
  });

  test("?find=span gives the largest span of one member", async () => {
    const res = await post({ ...header, member: { ...header.member, size: "2x10", plies: 2 } }, "?find=span");
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.largestSpan).toBeGreaterThan(4);
    expect(body.check.pass).toBe(true);
  });

  test("400 for bad input, naming the field", async () => {
    const res = await post({ ...header, spacingIn: 16 });
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.issues.map((i: { path: string }) => i.path)).toContain("tributaryFt");
    expect((await post(header, "?find=everything")).status).toBe(400);
  });
});
