import { renderToStaticMarkup } from "react-dom/server";
import { describe, expect, test } from "vitest";
import { BeamDiagram, diagramScales } from "@/components/diagrams/beam-diagram";
import { LoadDiagram } from "@/components/diagrams/load-diagram";
import { analyzeBeam } from "@/lib/solver/beam";

// A 12 ft simple span under 150 plf and a 900 lb post at 4 ft.
const L = 12;
const w = 150;
const P = 900;
const a = 4;
const beam = {
  length: L,
  E: 1_600_000,
  I: 98,
  supports: [
    { x: 0, type: "pin" as const },
    { x: L, type: "roller" as const },
  ],
  loads: [
    { type: "udl" as const, from: 0, to: L, w, case: "D" as const },
    { type: "point" as const, x: a, P, case: "L" as const },
  ],
};
const result = analyzeBeam(beam);

describe("BeamDiagram", () => {
  test("labels the largest moment with its value and position, as text a screen reader gets too", () => {
    // statics: R1 = wL/2 + P(L − a)/L (sum of moments about the right support)
    const R1 = (w * L) / 2 + (P * (L - a)) / L;
    expect(result.reactions[0].F).toBeCloseTo(R1, 9);
    const m = result.extremes.Mpos;
    const html = renderToStaticMarkup(
      <BeamDiagram
        title="Moment M (lb-ft)"
        quantity="M"
        unit="lb-ft"
        segments={result.segments}
        extremes={[{ x: m.x, value: m.value, label: "Largest moment" }]}
        supports={beam.supports}
      />,
    );
    const label = `${Math.round(m.value).toLocaleString("en-US")} lb-ft at`;
    expect(html).toContain(label);
    expect(html).toMatch(/role="img"/);
    expect(html).toContain(`aria-label="Moment M (lb-ft). Largest moment ${Math.round(m.value).toLocaleString("en-US")} lb-ft at`);
    expect(html).toMatch(/<path d="M[^"]*C/);
  });

  test("the shear diagram's path has a vertical step at the post", () => {
    const html = renderToStaticMarkup(
      <BeamDiagram title="Shear V (lb)" quantity="V" unit="lb" segments={result.segments} extremes={[]} supports={beam.supports} />,
    );
    const d = /data-testid="diagram-path-V"/.test(html) ? (/<path d="([^"]+)"[^>]*data-testid="diagram-path-V"/.exec(html)?.[1] ?? "") : "";
    expect(d).not.toBe("");
    // consecutive end points with the same x: the step
    const start = /^M(-?[\d.]+),(-?[\d.]+)/.exec(d);
    const ends = [
      [Number(start?.[1]), Number(start?.[2])],
      ...[...d.matchAll(/C[^C]*?,?(-?[\d.]+),(-?[\d.]+)(?=C|$)/g)].map((m) => [Number(m[1]), Number(m[2])]),
    ];
    const steps = ends.filter((p, i) => i > 0 && Math.abs(p[0] - ends[i - 1][0]) < 1e-6 && Math.abs(p[1] - ends[i - 1][1]) > 1);
    // the post's x on the drawing: the same scale the diagram uses
    const scales = diagramScales(L, { min: -1, max: 1 }, "V");
    expect(steps.map((p) => p[0])).toContainEqual(expect.closeTo(scales.x(a), 2));
    // with the supports' steps at both ends: three in all (d3-path writes 3 decimals)
    expect(steps).toHaveLength(3);
  });
});

describe("LoadDiagram", () => {
  test("names every load with its case and size", () => {
    const html = renderToStaticMarkup(<LoadDiagram title="Loads" lengthFt={L} supports={beam.supports} loads={beam.loads} reactions={result.reactions} />);
    expect(html).toContain("D 150 plf");
    expect(html).toContain("L 900 lb");
    expect(html).toContain(`R ${Math.round(result.reactions[0].F).toLocaleString("en-US")} lb`);
  });
});
