// Text contrast for reading in sunlight: every pair of text color and background the screens use is 7:1 or
// better, WCAG 2.2 SC 1.4.6 Contrast (Enhanced, AAA). The colors are read from tailwind.config.ts (the only place
// they are defined) and the ratio computed here from WCAG 2.2's definitions of "relative luminance" and
// "contrast ratio" (sRGB channels linearized, L = 0.2126 R + 0.7152 G + 0.0722 B, ratio (L1 + 0.05) / (L2 + 0.05)).
// The browser scan in tests/e2e/sunlight.e2e.test.ts checks the rendered pages with axe-core's 7:1 rule as well.
import { describe, expect, test } from "vitest";
import config from "@/tailwind.config";

type Shades = Record<string, string | Record<string, string>>;
const colors = (config.theme?.extend?.colors ?? {}) as Shades;

/** A color by its Tailwind name: "ink", "ink-soft", "paper-sunk", "white". */
function color(name: string): string {
  if (name === "white") return "#FFFFFF";
  const [family, shade] = name.split("-");
  const entry = colors[family];
  const value = typeof entry === "string" ? (shade ? undefined : entry) : entry?.[shade ?? "DEFAULT"];
  if (!value) throw new Error(`no color ${name} in tailwind.config.ts`);
  return value;
}

function channels(hex: string): [number, number, number] {
  const m = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(hex);
  if (!m) throw new Error(`not a #rrggbb color: ${hex}`);
  return [parseInt(m[1], 16), parseInt(m[2], 16), parseInt(m[3], 16)];
}

/** WCAG 2.2 relative luminance of an sRGB color. */
function relativeLuminance(hex: string): number {
  const [r, g, b] = channels(hex).map((c) => {
    const s = c / 255;
    return s <= 0.04045 ? s / 12.92 : ((s + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

function contrastRatio(a: string, b: string): number {
  const [hi, lo] = [relativeLuminance(a), relativeLuminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

/** `top` at `alpha` over `under`, as a browser composites a translucent background (bg-amber-light/40). */
function over(top: string, alpha: number, under: string): string {
  const t = channels(top);
  const u = channels(under);
  return `#${t
    .map((c, i) =>
      Math.round(c * alpha + u[i] * (1 - alpha))
        .toString(16)
        .padStart(2, "0"),
    )
    .join("")}`;
}

describe("the contrast formula", () => {
  test.each([
    // the ends of the scale, by the definition (WCAG 2.2, "contrast ratio": 1:1 to 21:1)
    { fg: "#000000", bg: "#FFFFFF", ratio: 21 },
    { fg: "#FFFFFF", bg: "#FFFFFF", ratio: 1 },
    // #767676 on white, the lightest gray widely cited as passing 4.5:1 (from memory: 4.54:1)
    { fg: "#767676", bg: "#FFFFFF", ratio: 4.54 },
  ])("$fg on $bg is $ratio:1 (to 0.01)", ({ fg, bg, ratio }) => {
    expect(contrastRatio(fg, bg)).toBeCloseTo(ratio, 2);
  });
});

const PAPERS = ["paper", "paper-raised", "paper-sunk", "spruce-light", "amber-light"];

// Which text sits on which background (the components' own classes: text-ink, text-graphite on cards, hints,
// chips and the support editor's tint; links and ghost buttons in spruce; state words in their "-ink" shades on
// their own tints and on paper; white on filled buttons; paper on the current step).
const PAIRS: { text: string; on: string; where: string }[] = [
  ...["ink", "ink-soft", "graphite"].flatMap((text) => PAPERS.map((on) => ({ text, on, where: "body, hint and secondary text" }))),
  ...["paper", "paper-raised", "paper-sunk", "spruce-light"].map((on) => ({ text: "spruce", on, where: "links, ghost and secondary buttons" })),
  ...["paper", "paper-raised", "sound-bg"].map((on) => ({ text: "sound-ink", on, where: "OK badges and words" })),
  ...["paper", "paper-raised", "over-bg"].map((on) => ({ text: "over-ink", on, where: "Over badges, field errors" })),
  ...["paper", "paper-raised", "caution-bg"].map((on) => ({ text: "caution-ink", on, where: "the caution" })),
  { text: "spruce-dark", on: "spruce-light", where: "steps done" },
  { text: "white", on: "spruce", where: "primary buttons" },
  { text: "white", on: "spruce-dark", where: "primary buttons, pressed" },
  { text: "white", on: "over", where: "danger buttons" },
  { text: "white", on: "over-ink", where: "danger buttons, pressed" },
  { text: "paper", on: "ink", where: "the current step" },
];

describe("every text on its background is 7:1 or better (WCAG 2.2 SC 1.4.6, AAA)", () => {
  test.each(PAIRS)("$text on $on ($where)", ({ text, on }) => {
    expect(contrastRatio(color(text), color(on))).toBeGreaterThanOrEqual(7);
  });

  test.each(["ink", "ink-soft", "graphite"])("%s on the support editor's tint (amber-light at 40% over paper)", (text) => {
    expect(contrastRatio(color(text), over(color("amber-light"), 0.4, color("paper")))).toBeGreaterThanOrEqual(7);
  });
});
