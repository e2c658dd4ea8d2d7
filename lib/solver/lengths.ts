/** Lengths written the way a builder reads a tape: feet and inches to the nearest 1/16 in. Pure. */

function gcd(a: number, b: number): number {
  return b === 0 ? a : gcd(b, a % b);
}

/**
 * Feet and inches to the nearest 1/16 in, the way a builder reads a tape:
 * 12.5 → 12' 6"; 12.541666 → 12' 6-1/2"; 0.5 → 6"; 10 → 10' 0".
 */
export function formatFeetInches(feet: number): string {
  if (!Number.isFinite(feet)) return "—";
  const negative = feet < 0;
  const sixteenths = Math.round(Math.abs(feet) * 12 * 16);
  const ft = Math.floor(sixteenths / (12 * 16));
  const restSixteenths = sixteenths - ft * 12 * 16;
  const wholeIn = Math.floor(restSixteenths / 16);
  const frac = restSixteenths - wholeIn * 16;
  let inchText = String(wholeIn);
  if (frac > 0) {
    const g = gcd(frac, 16);
    inchText = `${wholeIn}-${frac / g}/${16 / g}`;
    if (wholeIn === 0 && ft === 0) inchText = `${frac / g}/${16 / g}`;
  }
  const body = ft === 0 && sixteenths > 0 ? `${inchText}"` : `${ft}' ${inchText}"`;
  return negative ? `−${body}` : body;
}

/** Inches to the nearest 1/16 in without feet, e.g. for bearing lengths: 3.5 → 3-1/2". */
export function formatInches(inches: number): string {
  if (!Number.isFinite(inches)) return "—";
  const sixteenths = Math.round(Math.abs(inches) * 16);
  const whole = Math.floor(sixteenths / 16);
  const frac = sixteenths - whole * 16;
  if (frac === 0) return `${whole}"`;
  const g = gcd(frac, 16);
  return whole === 0 ? `${frac / g}/${16 / g}"` : `${whole}-${frac / g}/${16 / g}"`;
}
