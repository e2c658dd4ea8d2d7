import { describe, expect, test } from "vitest";
import { POST } from "@/app/api/check/route";

const post = (body: unknown) =>
  POST(
    new Request("http://localhost/api/check", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: typeof body === "string" ? body : JSON.stringify(body),
    }),
    { params: Promise.resolve({}) },
  );

const joist = {
  member: { material: "sawn", species: "Hem-Fir", grade: "No.2", size: "2x10", plies: 1 },
  lengthFt: 13,
  supports: [
    { x: 0, type: "pin" },
    { x: 13, type: "roller" },
  ],
  spacingIn: 16,
  loads: [
    { type: "area", case: "L", psf: 40 },
    { type: "area", case: "D", psf: 10 },
  ],
  bearingIn: 1.5,
  conditions: { wet: false, incised: false, repetitive: true, unbracedLengthFt: 0, selfWeight: true },
  limits: { live: 360, total: 240 },
  method: "asd",
};

describe("POST /api/check", () => {
  test("answers the contract for a sawn joist", async () => {
    const res = await post(joist);
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(typeof body.pass).toBe("boolean");
    expect(body.checks.map((c: { name: string }) => c.name)).toEqual(["bending", "shear", "deflection-live", "deflection-total", "bearing"]);
    for (const c of body.checks) {
      expect(c).toEqual(
        expect.objectContaining({ demand: expect.any(Number), capacity: expect.any(Number), unit: expect.any(String), ratio: expect.any(Number) }),
      );
      expect(c.ratio).toBeCloseTo(c.demand / c.capacity, 2);
    }
    expect(body.governing).toBe(
      body.checks.reduce((a: { ratio: number; name: string }, b: { ratio: number; name: string }) => (b.ratio > a.ratio ? b : a)).name,
    );
    expect(body.reactions).toHaveLength(2);
    expect(body.factors.CD).toBe(1);
    expect(body.caution).toMatch(/Preliminary sizing/);
  });

  test.each([
    [
      "engineered",
      { ...joist, member: { material: "engineered", product: "LVL 1.9E", width: 1.75, depth: 11.875, plies: 2 }, spacingIn: undefined, tributaryFt: 6 },
    ],
    [
      "steel",
      {
        ...joist,
        member: { material: "steel", shape: "W8x18", grade: "A992" },
        spacingIn: undefined,
        tributaryFt: 6,
        lengthFt: 16,
        supports: [
          { x: 0, type: "pin" },
          { x: 16, type: "roller" },
        ],
      },
    ],
    ["built-up", { ...joist, member: { ...joist.member, plies: 3 }, spacingIn: undefined, tributaryFt: 6 }],
    ["steel LRFD", { ...joist, member: { material: "steel", shape: "W10x22" }, spacingIn: undefined, tributaryFt: 6, method: "lrfd" }],
  ])("answers for a %s member", async (_label, input) => {
    const res = await post(input);
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.checks.length).toBeGreaterThan(3);
  });

  test("takes loadStandard and kind; the answer names the basis", async () => {
    const res = await post({ ...joist, loadStandard: "ASCE 7-22", kind: "floor-joist" });
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.loadStandard).toBe("ASCE 7-22");
    expect(body.kind).toBe("floor-joist");
    expect((await (await post(joist)).json()).loadStandard).toBe("ASCE 7-16");
  });

  test.each([
    ["loadStandard", { loadStandard: "ASCE 7-05" }, /"ASCE 7-16", "ASCE 7-22"/],
    ["kind", { kind: "lintel" }, /"floor-joist", "header", "beam", "deck-joist", "deck-beam", "rafter"/],
  ])("400 naming %s and its allowed values", async (field, extra, allowed) => {
    const res = await post({ ...joist, ...extra });
    expect(res.status).toBe(400);
    const body = await res.json();
    const issue = body.issues.find((i: { path: string }) => i.path === field);
    expect(issue.message).toMatch(allowed);
  });

  test("400 with the field named for bad input; unknown species lists the tables", async () => {
    const res = await post({ ...joist, member: { ...joist.member, species: "Cedar" } });
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.error).toBe("invalid input");
    expect(body.issues[0].path).toBe("member.species");
    expect(body.issues[0].message).toMatch(/Hem-Fir/);
  });

  test("400 for a body that is not JSON, and for a bearing of 0", async () => {
    expect((await post("{nope")).status).toBe(400);
    const res = await post({ ...joist, bearingIn: 0 });
    expect(res.status).toBe(400);
    expect((await res.json()).issues[0].path).toBe("bearingIn");
  });
});
