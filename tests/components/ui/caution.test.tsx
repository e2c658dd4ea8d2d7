// @vitest-environment jsdom
import { cleanup, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, test } from "vitest";
import { Caution } from "@/components/ui/caution";
import { CAUTION as CAUTION_TEXT } from "@/lib/caution";

afterEach(cleanup);

describe("Caution", () => {
  // The product's caution wording (DESIGN.md, "The caution"): each of its three sentences, in order.
  test("its words are the product's caution, in order", () => {
    const sentences = [
      "Preliminary sizing for typical house framing.",
      "Check loads, spans and supports on site.",
      "Your local building code and building official govern; have a licensed engineer review anything unusual",
    ];
    const positions = sentences.map((sentence) => CAUTION_TEXT.indexOf(sentence));
    expect(positions.every((position) => position >= 0)).toBe(true);
    expect([...positions].sort((a, b) => a - b)).toEqual(positions);
  });

  test("the short variant has the caution but not the list", () => {
    render(<Caution />);
    const aside = screen.getByRole("complementary", { name: "Safety caution" });
    expect(aside.textContent).toContain(CAUTION_TEXT);
    expect(screen.queryByText("Spanlark does not check:")).toBeNull();
  });

  test.each(["Connections", "Fasteners", "footings", "Lateral loads", "without blocking", "Ponding", "vibration"])(
    "the full variant says it does not check: %s",
    (word) => {
      render(<Caution variant="full" />);
      const items = screen.getAllByRole("listitem").map((item) => item.textContent ?? "");
      expect(items.some((text) => text.includes(word))).toBe(true);
    },
  );
});
