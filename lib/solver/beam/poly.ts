/**
 * Small polynomial helpers for the beam engine. Coefficients are stored in ascending powers
 * (c[0] + c[1]·ξ + c[2]·ξ² + …), read from a flat array at an offset so that no array is
 * allocated per evaluation.
 */

/** Value of the polynomial of degree `deg` stored at a[off..off+deg], at ξ (Horner). */
export function polyAt(a: ArrayLike<number>, off: number, deg: number, xi: number): number {
  let v = a[off + deg];
  for (let k = deg - 1; k >= 0; k--) v = v * xi + a[off + k];
  return v;
}

/**
 * Roots of c0 + c1·ξ + c2·ξ² strictly inside (lo, hi), pushed onto `out` in ascending order.
 * Uses the cancellation-free form of the quadratic formula.
 */
export function quadraticRootsIn(c0: number, c1: number, c2: number, lo: number, hi: number, out: number[]): void {
  const scale = Math.abs(c0) + Math.abs(c1) * hi + Math.abs(c2) * hi * hi;
  if (scale === 0) return;
  if (Math.abs(c2) * hi * hi <= 1e-14 * scale) {
    if (Math.abs(c1) * hi <= 1e-14 * scale) return;
    const r = -c0 / c1;
    if (r > lo && r < hi) out.push(r);
    return;
  }
  const disc = c1 * c1 - 4 * c2 * c0;
  if (disc < 0) return;
  const sq = Math.sqrt(disc);
  const qv = -0.5 * (c1 + (c1 >= 0 ? sq : -sq));
  let r1 = qv / c2;
  let r2 = qv !== 0 ? c0 / qv : r1;
  if (r1 > r2) {
    const t = r1;
    r1 = r2;
    r2 = t;
  }
  if (r1 > lo && r1 < hi) out.push(r1);
  if (r2 !== r1 && r2 > lo && r2 < hi) out.push(r2);
}

/**
 * The root of a polynomial that is monotone on [a, b] and changes sign there (fa·fb < 0),
 * by the Illinois variant of regula falsi with a bisection guard; converges to machine precision.
 */
export function bracketedRoot(c: ArrayLike<number>, off: number, deg: number, a: number, b: number, fa: number, fb: number): number {
  let side = 0;
  let x = a;
  for (let it = 0; it < 100; it++) {
    x = (a * fb - b * fa) / (fb - fa);
    if (!(x > a && x < b)) x = 0.5 * (a + b);
    const fx = polyAt(c, off, deg, x);
    if (fx === 0) return x;
    if (fx > 0 === fb > 0) {
      b = x;
      fb = fx;
      if (side === -1) fa *= 0.5;
      side = -1;
    } else {
      a = x;
      fa = fx;
      if (side === 1) fb *= 0.5;
      side = 1;
    }
    if (b - a <= 4e-16 * (Math.abs(a) + Math.abs(b)) + 1e-300) break;
  }
  return x;
}

/**
 * Roots strictly inside (lo, hi) of the polynomial at c[off..off+deg], given the sorted interior
 * roots of its derivative (`crit`), which split the interval into monotone pieces. Appends to `out`.
 */
export function rootsFromCritical(c: ArrayLike<number>, off: number, deg: number, lo: number, hi: number, crit: readonly number[], out: number[]): void {
  let a = lo;
  let fa = polyAt(c, off, deg, a);
  for (let i = 0; i <= crit.length; i++) {
    const b = i < crit.length ? crit[i] : hi;
    const fb = polyAt(c, off, deg, b);
    if (fa === 0 && a > lo) {
      if (out.length === 0 || out[out.length - 1] !== a) out.push(a);
    } else if ((fa < 0 && fb > 0) || (fa > 0 && fb < 0)) {
      out.push(bracketedRoot(c, off, deg, a, b, fa, fb));
    }
    a = b;
    fa = fb;
  }
}
