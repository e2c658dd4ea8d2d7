// @vitest-environment jsdom
import { cleanup, render } from "@testing-library/react";
import { afterEach, describe, expect, test } from "vitest";
import { TradeText } from "@/components/ui/trade-text";

afterEach(cleanup);

describe("TradeText", () => {
  test('draws "1-1/2"" and "2-ply" in no-wrap spans, the rest as plain text', () => {
    const text = `2-ply 2x10 No.2 with 1/2" spacer — 1-1/2" bearing each end`;
    const { container } = render(
      <p>
        <TradeText text={text} />
      </p>,
    );
    expect(container.textContent).toBe(text);
    const kept = [...container.querySelectorAll("span.whitespace-nowrap")].map((s) => s.textContent);
    expect(kept).toEqual(["2-ply", '1-1/2"']);
  });
});
