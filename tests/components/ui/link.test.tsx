// @vitest-environment jsdom
import { cleanup, fireEvent, render, screen } from "@testing-library/react";
import { afterEach, describe, expect, test, vi } from "vitest";

const prefetch = vi.fn();
vi.mock("next/navigation", () => ({ useRouter: () => ({ prefetch, push: vi.fn(), replace: vi.fn(), refresh: vi.fn() }) }));

const { Link } = await import("@/components/ui/link");

afterEach(() => {
  cleanup();
  prefetch.mockClear();
});

describe("Link (fetches the next page when reached for)", () => {
  test("a link to its address; drawing it asks for nothing", () => {
    render(<Link href="/jobs">Jobs</Link>);
    expect(screen.getByRole("link", { name: "Jobs" }).getAttribute("href")).toBe("/jobs");
    expect(prefetch).not.toHaveBeenCalled();
  });

  test.each([
    ["a finger lands on it", (a: HTMLElement) => fireEvent.touchStart(a)],
    ["the pointer moves over it", (a: HTMLElement) => fireEvent.pointerEnter(a)],
    ["the keyboard focuses it", (a: HTMLElement) => fireEvent.focus(a)],
  ])("%s: the page is fetched ahead", (_, reach) => {
    render(<Link href={{ pathname: "/size", search: "?kind=header" }}>Header</Link>);
    reach(screen.getByRole("link", { name: "Header" }));
    expect(prefetch).toHaveBeenCalledWith("/size?kind=header");
  });

  test("the caller's own handlers still run", () => {
    const onFocus = vi.fn();
    render(
      <Link href="/account" onFocus={onFocus}>
        Account
      </Link>,
    );
    fireEvent.focus(screen.getByRole("link", { name: "Account" }));
    expect(onFocus).toHaveBeenCalledTimes(1);
    expect(prefetch).toHaveBeenCalledWith("/account");
  });
});
