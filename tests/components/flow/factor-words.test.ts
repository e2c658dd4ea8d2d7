import { describe, expect, test } from "vitest";
import { factorRows } from "@/components/flow/member-detail";
import { checkMember } from "@/lib/solver/design";
import { STARTER_TABLES } from "@/lib/tables";

// Cb names two different factors: the bearing area factor of NDS 2018 §3.10.4 in wood, the lateral-torsional
// buckling modification factor of AISC 360-16 §F1 in steel. The member check must not call the steel one
// "bearing area".
const beam = (member: Record<string, unknown>) =>
  checkMember(
    {
      kind: "beam",
      lengthFt: 12,
      supports: [
        { x: 0, type: "pin" },
        { x: 12, type: "roller" },
      ],
      tributaryFt: 6,
      loads: [
        { type: "area", case: "D", psf: 15 },
        { type: "area", case: "L", psf: 40 },
      ],
      member,
    },
    STARTER_TABLES,
  );

describe("the member check's factor names", () => {
  test("a W-shape's Cb reads as the moment-gradient factor", () => {
    const rows = factorRows(beam({ material: "steel", shape: "W8x18" }).factors);
    const cb = rows.find((r) => r.name.startsWith("Cb"));
    expect(cb?.name).toBe("Cb, moment gradient");
  });

  test("a sawn beam's Cb reads as the bearing area factor", () => {
    const rows = factorRows(beam({ material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x12", plies: 3 }).factors);
    const cb = rows.find((r) => r.name.startsWith("Cb"));
    expect(cb?.name).toBe("Cb, bearing area");
  });
});
