import { describe, expect, test } from "vitest";
import { POST as checkPost } from "@/app/api/check/route";
import { POST as sizePost } from "@/app/api/size/route";
import { POST as solvePost } from "@/app/api/solve/route";
import { BODY_LIMITS, HttpError, parseJson, readBodyBytes, readBodyText } from "@/lib/http";
import { MAX_CSV_BYTES } from "@/lib/tables/csv/format";
import { FORM_OVERHEAD_BYTES } from "@/lib/tables/csv/upload";
import { z } from "zod";

const CHUNK = 16 * 1024;

/** A body of `totalBytes` sent in CHUNK pieces, counting how much the server pulled. */
function meteredBody(totalBytes: number): { stream: ReadableStream<Uint8Array>; pulled: () => number } {
  let sent = 0;
  const chunk = new Uint8Array(CHUNK).fill(0x20);
  const stream = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (sent >= totalBytes) return controller.close();
      const n = Math.min(CHUNK, totalBytes - sent);
      sent += n;
      controller.enqueue(n === CHUNK ? chunk : chunk.subarray(0, n));
    },
  });
  return { stream, pulled: () => sent };
}

function streamingRequest(url: string, body: ReadableStream<Uint8Array>, headers: Record<string, string> = {}): Request {
  return new Request(url, { method: "POST", headers: { "content-type": "application/json", ...headers }, body, duplex: "half" } as RequestInit);
}

const HUNDRED_MB = 100 * 1024 * 1024;

describe("readBodyBytes", () => {
  test("reads a body under the cap whole", async () => {
    const text = JSON.stringify({ a: "x".repeat(1000) });
    expect(await readBodyText(new Request("http://localhost/", { method: "POST", body: text }), 2000)).toBe(text);
  });

  test("a body exactly at the cap is accepted; one byte more is refused", async () => {
    const atCap = new Request("http://localhost/", { method: "POST", body: "x".repeat(100) });
    expect((await readBodyBytes(atCap, 100)).byteLength).toBe(100);
    const over = new Request("http://localhost/", { method: "POST", body: "x".repeat(101) });
    await expect(readBodyBytes(over, 100)).rejects.toMatchObject({ status: 413 });
  });

  test("no body reads as empty", async () => {
    expect((await readBodyBytes(new Request("http://localhost/"), 10)).byteLength).toBe(0);
  });

  test("a chunked 100 MB body stops being read soon after the cap (running count)", async () => {
    const { stream, pulled } = meteredBody(HUNDRED_MB);
    const err = await readBodyBytes(streamingRequest("http://localhost/", stream), 64 * 1024).catch((e: unknown) => e);
    expect(err).toBeInstanceOf(HttpError);
    expect((err as HttpError).status).toBe(413);
    // The stream may have one chunk queued ahead of the reader (its high-water mark), no more.
    expect(pulled()).toBeLessThanOrEqual(64 * 1024 + 2 * CHUNK);
  });

  test("a stated Content-Length over the cap is refused before any byte is read", async () => {
    const { stream, pulled } = meteredBody(HUNDRED_MB);
    const req = streamingRequest("http://localhost/", stream, { "content-length": String(HUNDRED_MB) });
    await expect(readBodyBytes(req, 64 * 1024)).rejects.toMatchObject({ status: 413 });
    expect(pulled()).toBeLessThanOrEqual(CHUNK); // at most what the stream queued on its own
  });

  test("parseJson caps at the JSON limit by default and names it", async () => {
    const big = JSON.stringify({ note: "x".repeat(BODY_LIMITS.json) });
    const err = await parseJson(new Request("http://localhost/", { method: "POST", body: big }), z.object({ note: z.string() })).catch((e: unknown) => e);
    expect(err).toMatchObject({ status: 413, details: { limitBytes: BODY_LIMITS.json } });
    expect((err as HttpError).message).toMatch(/too large.*256 KB/);
  });

  test("the CSV import cap holds the largest accepted file and its form framing", () => {
    expect(BODY_LIMITS.csvImport).toBeGreaterThanOrEqual(MAX_CSV_BYTES + FORM_OVERHEAD_BYTES);
    expect(BODY_LIMITS.engine).toBeLessThan(BODY_LIMITS.csvImport);
  });
});

describe("routes refuse a body over their cap with a JSON 413", () => {
  test.each([
    ["solve", solvePost, "http://localhost/api/solve"],
    ["check", checkPost, "http://localhost/api/check"],
    ["size", sizePost, "http://localhost/api/size"],
  ])("/api/%s, 100 MB chunked", async (_name, post, url) => {
    const { stream, pulled } = meteredBody(HUNDRED_MB);
    const res = await post(streamingRequest(url, stream), { params: Promise.resolve({}) });
    expect(res.status).toBe(413);
    expect(res.headers.get("content-type")).toMatch(/application\/json/);
    const body = await res.json();
    expect(body.error).toMatch(/too large.*64 KB/);
    expect(body.limitBytes).toBe(BODY_LIMITS.engine);
    expect(pulled()).toBeLessThanOrEqual(BODY_LIMITS.engine + 2 * CHUNK);
  });

  test("next-auth's POST (sign-in, sign-out) is capped at the JSON limit before next-auth reads it", async () => {
    const { POST } = await import("@/app/api/auth/[...nextauth]/route");
    const { stream, pulled } = meteredBody(HUNDRED_MB);
    const req = streamingRequest("http://localhost/api/auth/callback/credentials", stream, { "content-type": "application/x-www-form-urlencoded" });
    const res = await POST(req, { params: Promise.resolve({ nextauth: ["callback", "credentials"] }) });
    expect(res.status).toBe(413);
    expect((await res.json()).limitBytes).toBe(BODY_LIMITS.json);
    expect(pulled()).toBeLessThanOrEqual(BODY_LIMITS.json + 2 * CHUNK);
  });

  test("the largest valid solve input fits under the cap", async () => {
    // 20 supports, 200 linear loads and 1,000 stations, every number with many digits: the schema's limits.
    const L = 123.456789012345;
    const body = {
      length: L,
      E: 1_600_000.123456789,
      I: 98.7654321012345,
      supports: Array.from({ length: 20 }, (_, i) => ({ x: (L * i) / 19, type: i === 0 ? "pin" : "roller" })),
      loads: Array.from({ length: 200 }, (_, i) => ({
        type: "linear",
        from: (L * i) / 200,
        to: (L * (i + 1)) / 200,
        w1: -123.456789012345,
        w2: -234.567890123456,
        case: "D",
      })),
      at: Array.from({ length: 1000 }, (_, i) => (L * i) / 999),
    };
    const text = JSON.stringify(body);
    expect(new TextEncoder().encode(text).byteLength).toBeLessThan(BODY_LIMITS.engine);
    const res = await solvePost(new Request("http://localhost/api/solve", { method: "POST", headers: { "content-type": "application/json" }, body: text }), {
      params: Promise.resolve({}),
    });
    expect(res.status).toBe(200);
  });
});
