import { describe, expect, test } from "vitest";
import { DEFAULT_RETURN_PATH, safeReturnPath, sameOriginRedirect } from "@/lib/auth/return-path";

const ORIGIN = "https://app.spanlark.test";

// The oracle for every refused row: what a browser does with the value as a link on our page. Node's URL is
// the WHATWG URL Standard's parser (https://url.spec.whatwg.org/, the living standard browsers implement).
function browserGoesTo(value: string): string {
  return new URL(value, ORIGIN).origin;
}

describe("safeReturnPath refuses values a browser would take off our origin", () => {
  test.each([
    ["tab inside the slashes", "/\t/evil.example/"],
    ["newline inside the slashes", "/\n/evil.example/"],
    ["carriage return inside the slashes", "/\r/evil.example"],
    ["scheme-relative", "//evil.example"],
    ["backslash after slash", "/\\evil.example"],
    ["two backslashes", "\\\\evil.example"],
    ["slash backslash slash", "/\\/evil.example"],
    ["leading space", " //evil.example"],
    ["leading tab", "\t//evil.example"],
    ["leading control character", "\u0001//evil.example"],
    ["user info that names our host", "//app.spanlark.test@evil.example/"],
  ])("%s", (_label, value) => {
    expect(browserGoesTo(value)).not.toBe(ORIGIN); // the attack is real in a browser
    expect(safeReturnPath(value, ORIGIN)).toBe(DEFAULT_RETURN_PATH);
  });

  test.each([
    ["absolute address elsewhere", "https://evil.example/"],
    ["scheme with no slashes", "https:evil.example"],
    ["script", "javascript:alert(1)"],
    ["data", "data:text/html,hi"],
    ["percent-encoded slashes, no leading slash", "%2F%2Fevil.example"],
    ["encoded tab, no leading slash", "%09//evil.example"],
    ["our own origin written in full (we take paths only)", `${ORIGIN}/jobs`],
    ["empty", ""],
  ])("%s", (_label, value) => {
    expect(safeReturnPath(value, ORIGIN)).toBe(DEFAULT_RETURN_PATH);
  });

  test.each([
    ["dot segment before a double slash", "/.//evil.example"],
    ["parent segments up to a double slash", "/jobs/..//evil.example"],
  ])("%s (the parsed path starts with //, which would leave as a link)", (_label, value) => {
    expect(browserGoesTo(value)).toBe(ORIGIN);
    expect(new URL(value, ORIGIN).pathname.startsWith("//")).toBe(true);
    expect(safeReturnPath(value, ORIGIN)).toBe(DEFAULT_RETURN_PATH);
  });

  test.each([null, undefined])("missing (%s)", (value) => {
    expect(safeReturnPath(value, ORIGIN)).toBe(DEFAULT_RETURN_PATH);
  });
});

describe("safeReturnPath keeps our own paths, as the browser would read them", () => {
  test.each([
    ["a page", "/billing", "/billing"],
    ["query and fragment", "/size?job=1&member=2&save=1#answer", "/size?job=1&member=2&save=1#answer"],
    ["percent-encoded slashes stay encoded (one path segment)", "/%2F%2Fevil.example", "/%2F%2Fevil.example"],
    ["encoded backslashes stay encoded", "/%5C%5Cevil.example", "/%5C%5Cevil.example"],
    ["a tab inside a segment is dropped, as the browser does", "/bil\tling", "/billing"],
    ["dot segments resolved", "/jobs/../sheets", "/sheets"],
  ])("%s", (_label, value, expected) => {
    const path = safeReturnPath(value, ORIGIN);
    expect(path).toBe(expected);
    expect(new URL(path, ORIGIN).origin).toBe(ORIGIN);
  });

  test("the answer does not depend on which origin stands in", () => {
    expect(safeReturnPath("/sheets?x=1")).toBe("/sheets?x=1");
    expect(safeReturnPath("/\t/evil.example/")).toBe(DEFAULT_RETURN_PATH);
  });

  test("an answer parses back to itself (it is safe to hand on as a link)", () => {
    for (const value of ["/a//b", "/a/./b", "/x?y=//z", "/q#//frag"]) {
      const path = safeReturnPath(value, ORIGIN);
      expect(safeReturnPath(path, ORIGIN)).toBe(path);
      expect(new URL(path, ORIGIN).origin).toBe(ORIGIN);
    }
  });
});

describe("sameOriginRedirect (next-auth's redirect callback)", () => {
  test.each([
    ["a path", "/jobs", `${ORIGIN}/jobs`],
    ["our full address", `${ORIGIN}/sheets?x=1`, `${ORIGIN}/sheets?x=1`],
    ["tab trick", "/\t/evil.example/", `${ORIGIN}${DEFAULT_RETURN_PATH}`],
    ["another host", "https://evil.example/", ORIGIN],
    ["our host on another port", "https://app.spanlark.test:8443/", ORIGIN],
    ["not an address", "::::", ORIGIN],
  ])("%s", (_label, url, expected) => {
    expect(sameOriginRedirect(url, ORIGIN)).toBe(expected);
  });
});
