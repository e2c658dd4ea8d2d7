import { createHash } from "node:crypto";
import { describe, expect, test } from "vitest";
import {
  CREW_TOKEN_BYTES,
  CREW_TOKEN_LENGTH,
  crewLinkUrl,
  hashCrewToken,
  looksLikeCrewToken,
  newCrewToken,
  openCrewToken,
  sealCrewToken,
  tokenMatchesHash,
} from "@/lib/crew/token";

const SECRET = "test-secret-for-vitest-only-0123456789";

describe("crew link tokens are unguessable", () => {
  test("each token carries 256 random bits as 43 URL-safe characters", () => {
    const token = newCrewToken();
    expect(CREW_TOKEN_BYTES * 8).toBeGreaterThanOrEqual(128);
    expect(token).toHaveLength(CREW_TOKEN_LENGTH);
    expect(token).toMatch(/^[A-Za-z0-9_-]+$/);
    expect(Buffer.from(token, "base64url")).toHaveLength(CREW_TOKEN_BYTES);
  });

  test("10,000 tokens are all different", () => {
    const seen = new Set(Array.from({ length: 10_000 }, newCrewToken));
    expect(seen.size).toBe(10_000);
  });

  test("the bits look uniform: each bit position is set about half the time", () => {
    // 4,000 tokens: each of the 256 bit positions is a binomial(4000, 1/2) count, sd = sqrt(4000)/2 ≈ 31.6.
    // A bound of 6 sd (±190) fails a fair generator with probability about 1e-9 per position.
    const n = 4000;
    const counts = new Array<number>(CREW_TOKEN_BYTES * 8).fill(0);
    for (let i = 0; i < n; i++) {
      const bytes = Buffer.from(newCrewToken(), "base64url");
      for (let b = 0; b < bytes.length * 8; b++) if ((bytes[b >> 3] >> (b & 7)) & 1) counts[b]++;
    }
    const sd = Math.sqrt(n) / 2;
    for (const c of counts) expect(Math.abs(c - n / 2)).toBeLessThan(6 * sd);
    // Shannon entropy of the byte values over all tokens, bits per byte: close to 8 for random bytes.
    const freq = new Array<number>(256).fill(0);
    let total = 0;
    for (let i = 0; i < n; i++) {
      for (const byte of Buffer.from(newCrewToken(), "base64url")) {
        freq[byte]++;
        total++;
      }
    }
    const entropy = -freq.reduce((s, f) => (f === 0 ? s : s + (f / total) * Math.log2(f / total)), 0);
    expect(entropy).toBeGreaterThan(7.99);
  });

  test("only the SHA-256 of the token is used for lookup", () => {
    const token = newCrewToken();
    expect(hashCrewToken(token)).toBe(createHash("sha256").update(token).digest("hex"));
    expect(tokenMatchesHash(token, hashCrewToken(token))).toBe(true);
    expect(tokenMatchesHash(newCrewToken(), hashCrewToken(token))).toBe(false);
  });

  test.each([
    { label: "a real token", value: newCrewToken(), ok: true },
    { label: "too short", value: "abc", ok: false },
    { label: "one character short", value: newCrewToken().slice(1), ok: false },
    { label: "a path trick", value: "../../api/sheets/x/pdf-aaaaaaaaaaaaaaaaaaaaaaa", ok: false },
    { label: "SQL text", value: "' OR 1=1 --aaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaa", ok: false },
  ])("$label looks like a token: $ok", ({ value, ok }) => {
    expect(looksLikeCrewToken(value)).toBe(ok);
  });
});

describe("the owner's copy of the token is sealed", () => {
  test("sealed and opened with the server's secret, never stored in the clear", () => {
    const token = newCrewToken();
    const sealed = sealCrewToken(token, SECRET);
    expect(sealed).not.toContain(token);
    expect(openCrewToken(sealed, SECRET)).toBe(token);
    expect(sealCrewToken(token, SECRET)).not.toBe(sealed);
  });

  test("another secret or a changed byte opens nothing", () => {
    const token = newCrewToken();
    const sealed = sealCrewToken(token, SECRET);
    expect(openCrewToken(sealed, "another-secret-0123456789abcdef")).toBeNull();
    const parts = sealed.split(".");
    const body = Buffer.from(parts[3], "base64url");
    body[0] ^= 1;
    expect(openCrewToken([parts[0], parts[1], parts[2], body.toString("base64url")].join("."), SECRET)).toBeNull();
    expect(openCrewToken("v0.a.b.c", SECRET)).toBeNull();
  });

  test("the link is the app's address, /crew/ and the token", () => {
    expect(crewLinkUrl("http://127.0.0.1:3100/", "T0k")).toBe("http://127.0.0.1:3100/crew/T0k");
  });
});
