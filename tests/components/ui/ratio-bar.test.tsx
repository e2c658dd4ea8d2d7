// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, test } from "vitest";
import { RATIO_BAR_MAX, RatioBar, ratioVerdict } from "@/components/ui/ratio-bar";

afterEach(cleanup);

describe("ratioVerdict", () => {
  // A member passes a check when demand / capacity <= 1 (common practice: unity check).
  test.each([
    { ratio: 0.82, pass: true, text: "OK 82%" },
    { ratio: 1, pass: true, text: "OK 100%" },
    { ratio: 0.996, pass: true, text: "OK 99.6%" },
    { ratio: 0.9996, pass: true, text: "OK 99.9%" },
    { ratio: 0.994, pass: true, text: "OK 99%" },
    { ratio: 1.004, pass: false, text: "Over 100.4%" },
    { ratio: 1.0001, pass: false, text: "Over 100.1%" },
    { ratio: 1.13, pass: false, text: "Over 113%" },
    { ratio: 0, pass: true, text: "OK 0%" },
  ])("$ratio reads $text", ({ ratio, pass, text }) => {
    const verdict = ratioVerdict(ratio);
    expect(verdict.pass).toBe(pass);
    expect(verdict.text).toBe(text);
  });

  test.each([Number.NaN, Number.POSITIVE_INFINITY, -0.5])("%s is not a result", (ratio) => {
    expect(ratioVerdict(ratio)).toMatchObject({ pass: false, text: "Not checked" });
  });
});

describe("RatioBar", () => {
  test("a pass just under the line reads under 100% on the bar, in words and not only in color", () => {
    render(<RatioBar ratio={0.996} label="Bending" />);
    expect(screen.getByText("OK 99.6%")).toBeTruthy();
    expect(screen.queryByText("OK 100%")).toBeNull();
  });

  test("a passing check says OK with its percent in words, not only in color", () => {
    const { container } = render(<RatioBar ratio={0.82} label="Bending" />);
    expect(screen.getByText("OK 82%")).toBeTruthy();
    expect(screen.getByText("Bending")).toBeTruthy();
    // The fill stops at 82% of a bar whose right end is RATIO_BAR_MAX.
    const fill = container.querySelector<HTMLElement>("[aria-hidden='true'] > div");
    expect(fill?.style.width).toBe(`${(0.82 / RATIO_BAR_MAX) * 100}%`);
  });

  test("a failing check says Over and marks the 100% line", () => {
    const { container } = render(<RatioBar ratio={1.13} label="Deflection (live, L/360)" detail="0.61 in of 0.54 in" />);
    expect(screen.getByText("Over 113%")).toBeTruthy();
    expect(screen.getByText("100%")).toBeTruthy();
    expect(screen.getByText("0.61 in of 0.54 in")).toBeTruthy();
    const limit = Array.from(container.querySelectorAll<HTMLElement>("div")).find((element) => element.style.left.startsWith("calc("));
    const limitPercent = Number(/calc\(([\d.]+)% - 1px\)/.exec(limit?.style.left ?? "")?.[1]);
    expect(limitPercent).toBeCloseTo((1 / RATIO_BAR_MAX) * 100, 3);
  });

  test("a ratio past the bar's end is capped and flagged, not drawn off the screen", () => {
    const { container } = render(<RatioBar ratio={2.4} label="Bearing" showScale={false} />);
    expect(screen.getByText("Over 240%")).toBeTruthy();
    expect(screen.queryByText("100%")).toBeNull();
    const fill = container.querySelector<HTMLElement>("[aria-hidden='true'] > div");
    expect(fill?.style.width).toBe("100%");
  });
});
