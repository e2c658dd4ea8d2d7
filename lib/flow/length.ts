/**
 * Lengths typed the way the trade writes them, parsed to decimal feet and echoed back in feet and
 * inches to the nearest 1/16 in. Pure: no React, no I/O.
 *
 * Accepted forms (spaces optional, ' ′ ’ for feet, " ″ ” '' for inches):
 *   12' 6"   12'6"   12' 6-1/2"   12' 6 1/2"   12'   6"   6-1/2"   150"   150 in   12 ft 6 in
 *   12-6     12-6-1/2   12 6   12 6 1/2   (feet then inches, the tape's shorthand: a dash or a space)
 *   12.5     12         (a bare number is feet)
 *   12 1/2   12-1/2     (a whole number and a fraction: so many feet and a fraction of a foot, 12' 6")
 *   3.8 m    380 cm    3800 mm
 */

import { formatFeetInches } from "@/lib/solver/lengths";

export { formatFeetInches, formatInches } from "@/lib/solver/lengths";

export type LengthParse = { ok: true; feet: number } | { ok: false; message: string };

const FT_PER_M = 1 / 0.3048;
const FOOT_MARK = "['′’]";
const INCH_MARK = `(?:"|″|”|''|′′|’’)`;
const NUM = String.raw`\d+(?:\.\d+)?|\.\d+`;
const FRACTION = String.raw`\d+\s*\/\s*\d+`;
// inches: a decimal, a whole number with a fraction ("6-1/2", "6 1/2") or a fraction alone ("1/2")
const INCHES = String.raw`(?:(\d+)(?:\s*-\s*|\s+)(${FRACTION})|(${FRACTION})|(${NUM}))`;

const FEET_INCHES = new RegExp(String.raw`^(${NUM})\s*(?:${FOOT_MARK}|ft|feet|foot)\s*(?:-?\s*${INCHES}\s*(?:${INCH_MARK}|in|inches|inch)?)?$`, "i");
const INCHES_ONLY = new RegExp(String.raw`^${INCHES}\s*(?:${INCH_MARK}|in|inches|inch)$`, "i");
const DASHED = new RegExp(String.raw`^(\d+)\s*-\s*${INCHES}$`);
// the same with a space, as typed on a phone's number pad: "12 6", "12 6 1/2", "12 6.5", "12 1/2" (the text is trimmed, one space)
const SPACED = new RegExp(String.raw`^(\d+) ${INCHES}$`);
const METRIC = new RegExp(String.raw`^(${NUM})\s*(m|cm|mm)$`, "i");
const BARE = new RegExp(String.raw`^(${NUM})$`);

const EXAMPLES = `12' 6", 12 6, 12-1/2, 150" or 3.8 m`;

/** Parses "a/b" to a number; null when the denominator is 0 or the fraction is not proper. */
function fraction(text: string): number | null {
  const [a, b] = text.split("/").map((s) => Number(s.trim()));
  if (!Number.isFinite(a) || !Number.isFinite(b) || b === 0) return null;
  return a / b;
}

type InchesParse = { ok: true; inches: number } | { ok: false; message: string };

function inchesFrom(whole: string | undefined, fracWithWhole: string | undefined, fracAlone: string | undefined, decimal: string | undefined): InchesParse {
  if (whole !== undefined && fracWithWhole !== undefined) {
    const f = fraction(fracWithWhole);
    if (f === null) return { ok: false, message: `"${fracWithWhole}" is not a fraction of an inch (the bottom number cannot be 0)` };
    if (f >= 1) return { ok: false, message: `"${fracWithWhole}" must be less than one inch, e.g. 6-1/2"` };
    return { ok: true, inches: Number(whole) + f };
  }
  if (fracAlone !== undefined) {
    const f = fraction(fracAlone);
    if (f === null) return { ok: false, message: `"${fracAlone}" is not a fraction of an inch (the bottom number cannot be 0)` };
    return { ok: true, inches: f };
  }
  if (decimal !== undefined) return { ok: true, inches: Number(decimal) };
  return { ok: true, inches: 0 };
}

/**
 * Parses a typed length to feet. The message on failure says what was wrong and shows the forms
 * that work; it never mentions the field, so the form can put its own label first.
 */
export function parseLength(raw: string): LengthParse {
  const text = raw.trim().replace(/\s+/g, " ");
  if (text === "") return { ok: false, message: `is empty: type a length such as ${EXAMPLES}` };
  if (/^-/.test(text)) return { ok: false, message: "cannot be negative" };
  if (text.includes(",")) return { ok: false, message: `use a point for decimals, not a comma (e.g. 3.8 m, 12.5)` };

  let m = BARE.exec(text);
  if (m) return finite(Number(m[1]));

  m = FEET_INCHES.exec(text);
  if (m) {
    const inches = inchesFrom(m[2], m[3], m[4], m[5]);
    if (!inches.ok) return inches;
    if (inches.inches >= 12)
      return {
        ok: false,
        message: `has ${trimNumber(inches.inches)} inches after the feet: inches must be under 12 (write ${feetInchesHint(Number(m[1]), inches.inches)})`,
      };
    return finite(Number(m[1]) + inches.inches / 12);
  }

  m = DASHED.exec(text) ?? SPACED.exec(text);
  if (m) {
    // a fraction right after the whole number is a fraction of a foot: 12-1/2 and 12 1/2 are twelve and a half feet
    if (m[4] !== undefined) {
      const f = fraction(m[4]);
      if (f === null) return { ok: false, message: `"${m[4]}" is not a fraction (the bottom number cannot be 0)` };
      if (f >= 1) return { ok: false, message: `"${m[4]}" must be less than one, e.g. 12 1/2 for twelve and a half feet` };
      return finite(Number(m[1]) + f);
    }
    const inches = inchesFrom(m[2], m[3], m[4], m[5]);
    if (!inches.ok) return inches;
    if (inches.inches >= 12)
      return { ok: false, message: `"${text}" reads as feet then inches, and inches must be under 12 (write ${feetInchesHint(Number(m[1]), inches.inches)})` };
    return finite(Number(m[1]) + inches.inches / 12);
  }

  m = INCHES_ONLY.exec(text);
  if (m) {
    const inches = inchesFrom(m[1], m[2], m[3], m[4]);
    if (!inches.ok) return inches;
    return finite(inches.inches / 12);
  }

  m = METRIC.exec(text);
  if (m) {
    const value = Number(m[1]);
    const unit = m[2].toLowerCase();
    const meters = unit === "m" ? value : unit === "cm" ? value / 100 : value / 1000;
    return finite(meters * FT_PER_M);
  }

  if (/[a-z]/i.test(text.replace(/\b(ft|feet|foot|in|inch|inches|m|cm|mm)\b/gi, ""))) {
    return { ok: false, message: `"${text}" has a unit or letters we do not read: type ${EXAMPLES}` };
  }
  return { ok: false, message: `"${text}" is not a length we can read: type ${EXAMPLES}` };
}

function finite(feet: number): LengthParse {
  if (!Number.isFinite(feet)) return { ok: false, message: "is not a number we can use" };
  return { ok: true, feet };
}

function trimNumber(n: number): string {
  return Number.isInteger(n) ? String(n) : String(Math.round(n * 1000) / 1000);
}

function feetInchesHint(feet: number, inches: number): string {
  return formatFeetInches(feet + inches / 12);
}

/** A short decimal-feet echo for engineers, e.g. 12.54 ft. */
export function formatDecimalFeet(feet: number): string {
  return `${(Math.round(feet * 100) / 100).toFixed(2)} ft`;
}
