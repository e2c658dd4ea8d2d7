/**
 * A demand-to-capacity ratio as the percent a builder reads ("OK 99.6%", "Over 100.4%"), one rule for every
 * screen, crew link, sheet and message. Whole percents, except where rounding would cross the 100% line: a pass
 * just under it (0.996) reads 99.6, never 100, and a failure just over it (1.004) reads 100.4, never 100 or less.
 * A pass exactly at the limit (1.000) reads 100. Tenths are cut toward the line's own side (floor for a pass,
 * ceiling for a failure), so the number never crosses it.
 */
export function ratioPercent(ratio: number, pass: boolean = ratio <= 1): string {
  const whole = Math.round(ratio * 100);
  if (pass) {
    if (ratio >= 1) return "100";
    if (whole < 100) return String(whole);
    return Math.min(99.9, Math.floor(ratio * 1000) / 10).toFixed(1);
  }
  if (whole > 100) return String(whole);
  return Math.max(100.1, Math.ceil(ratio * 1000) / 10).toFixed(1);
}
