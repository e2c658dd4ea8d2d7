// @vitest-environment jsdom
import { cleanup, render } from "@testing-library/react";
import { afterEach, describe, expect, test } from "vitest";
import { StatusBadge } from "@/components/ui/status-badge";

afterEach(cleanup);

describe("StatusBadge", () => {
  test.each([
    { status: "pass" as const, word: "OK" },
    { status: "fail" as const, word: "Over" },
    { status: "caution" as const, word: "Check" },
  ])("$status carries the word $word and an icon, not only a color", ({ status, word }) => {
    const { container } = render(<StatusBadge status={status} />);
    expect(container.textContent).toBe(word);
    expect(container.querySelector("svg")).not.toBeNull();
  });
});
