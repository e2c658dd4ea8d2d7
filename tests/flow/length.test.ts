import { describe, expect, test } from "vitest";
import { formatFeetInches, formatInches, parseLength } from "@/lib/flow/length";

// 1 ft = 0.3048 m exactly: the international yard and pound agreement (1959), NIST Handbook 44 Appendix C.
const M_PER_FT = 0.3048;
const TOL = 1e-12;

describe("parseLength: the trade's written forms (common practice)", () => {
  test.each([
    { text: `12' 6"`, feet: 12 + 6 / 12 },
    { text: `12'6"`, feet: 12 + 6 / 12 },
    { text: `12'-6"`, feet: 12 + 6 / 12 },
    { text: `12′ 6″`, feet: 12 + 6 / 12 },
    { text: `12’ 6”`, feet: 12 + 6 / 12 },
    { text: `12' 6''`, feet: 12 + 6 / 12 },
    { text: `12' 6-1/2"`, feet: 12 + 6.5 / 12 },
    { text: `12' 6 1/2"`, feet: 12 + 6.5 / 12 },
    { text: `12' 6-3/16"`, feet: 12 + (6 + 3 / 16) / 12 },
    { text: `12' 1/2"`, feet: 12 + 0.5 / 12 },
    { text: `12'`, feet: 12 },
    { text: `12.5'`, feet: 12.5 },
    { text: `12 ft 6 in`, feet: 12.5 },
    { text: `12ft`, feet: 12 },
    { text: `12-6`, feet: 12.5 },
    { text: `12 - 6`, feet: 12.5 },
    { text: `12-6-1/2`, feet: 12 + 6.5 / 12 },
    { text: `10-0`, feet: 10 },
    // typed on a phone's number pad, a space for the dash (common practice: feet, then inches)
    { text: `12 6`, feet: 12.5 },
    { text: `12  6`, feet: 12.5 },
    { text: `12 0`, feet: 12 },
    { text: `12 6.5`, feet: 12 + 6.5 / 12 },
    { text: `12 6 1/2`, feet: 12 + 6.5 / 12 },
    { text: `12 6-1/2`, feet: 12 + 6.5 / 12 },
    { text: `12 11 15/16`, feet: 12 + (11 + 15 / 16) / 12 },
    // a whole number and a fraction is a mixed number of feet, as 12.5 is
    { text: `12 1/2`, feet: 12.5 },
    { text: `12-1/2`, feet: 12.5 },
    { text: `9 3/4`, feet: 9.75 },
    { text: `12.5`, feet: 12.5 },
    { text: `13`, feet: 13 },
    { text: `.5`, feet: 0.5 },
    { text: `0`, feet: 0 },
    { text: `150"`, feet: 150 / 12 },
    { text: `150 in`, feet: 150 / 12 },
    { text: `6-1/2"`, feet: 6.5 / 12 },
    { text: `3/4"`, feet: 0.75 / 12 },
    { text: `  12'  6"  `, feet: 12.5 },
    { text: `3.8 m`, feet: 3.8 / M_PER_FT },
    { text: `3.8m`, feet: 3.8 / M_PER_FT },
    { text: `380 cm`, feet: 3.8 / M_PER_FT },
    { text: `3800 mm`, feet: 3.8 / M_PER_FT },
  ])("$text → $feet ft", ({ text, feet }) => {
    const parsed = parseLength(text);
    expect(parsed.ok).toBe(true);
    if (parsed.ok) expect(Math.abs(parsed.feet - feet)).toBeLessThan(TOL * Math.max(1, feet));
  });
});

describe("parseLength: bad forms say what is wrong", () => {
  test.each([
    { text: "", message: /empty/ },
    { text: "   ", message: /empty/ },
    { text: "-12", message: /negative/ },
    { text: "3,8 m", message: /point for decimals/ },
    { text: `12' 13"`, message: /inches must be under 12.*13' 1"/ },
    { text: "12-14", message: /feet then inches.*inches must be under 12/ },
    { text: "12 14", message: /feet then inches.*inches must be under 12.*13' 2"/ },
    { text: "12 5/4", message: /less than one/ },
    { text: "12 3/0", message: /bottom number cannot be 0/ },
    { text: "12 6 7", message: /not a length we can read/ },
    { text: "12  6  7/8/9", message: /not a length we can read/ },
    { text: `12' 6-3/0"`, message: /bottom number cannot be 0/ },
    { text: `12' 6-5/4"`, message: /less than one inch/ },
    { text: "twelve", message: /letters we do not read/ },
    { text: "12 yd", message: /unit or letters/ },
    { text: "12..5", message: /not a length we can read/ },
    { text: `12" 6'`, message: /not a length we can read/ },
    { text: "12-", message: /not a length we can read/ },
  ])("$text is refused", ({ text, message }) => {
    const parsed = parseLength(text);
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.message).toMatch(message);
  });
});

describe("formatFeetInches: echo to the nearest 1/16 in", () => {
  test.each([
    { feet: 12.5, text: `12' 6"` },
    { feet: 12 + 6.5 / 12, text: `12' 6-1/2"` },
    { feet: 12 + (6 + 3 / 16) / 12, text: `12' 6-3/16"` },
    { feet: 12 + (6 + 4 / 16) / 12, text: `12' 6-1/4"` },
    { feet: 10, text: `10' 0"` },
    { feet: 0.5, text: `6"` },
    { feet: 1 / 24 / 2, text: `1/4"` },
    // 3.8 m = 149.606 in = 12 ft 5.606 in; 5.606 in is 89.7/16 → 90/16 = 5-5/8 in
    { feet: 3.8 / M_PER_FT, text: `12' 5-5/8"` },
    // 11.99999 ft rounds up to a whole 12 ft, never 11' 12"
    { feet: 11.99999, text: `12' 0"` },
  ])("$feet ft → $text", ({ feet, text }) => {
    expect(formatFeetInches(feet)).toBe(text);
  });

  test("a parsed length echoes back as typed when it is on a 1/16 in", () => {
    for (const typed of [`12' 6-1/2"`, `9' 11-15/16"`, `0' 3/8"`]) {
      const parsed = parseLength(typed);
      expect(parsed.ok).toBe(true);
      if (parsed.ok) expect(formatFeetInches(parsed.feet)).toBe(typed.replace(/^0' /, ""));
    }
  });
});

describe("formatInches", () => {
  test.each([
    { inches: 3, text: `3"` },
    { inches: 3.5, text: `3-1/2"` },
    { inches: 4.5625, text: `4-9/16"` },
    { inches: 0.375, text: `3/8"` },
  ])("$inches in → $text", ({ inches, text }) => {
    expect(formatInches(inches)).toBe(text);
  });
});
