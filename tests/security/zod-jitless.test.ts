// The browser's zod runs without eval (the site's CSP allows none): instrumentation-client.ts turns on zod 4's
// jitless setting before the app's code. This proves the installed zod reads that setting and then never calls
// the Function constructor, neither to probe for eval nor to compile a parser; the last test shows the spy sees
// both when the setting is off. (zod is loaded once per test file, so the order of the tests matters.)
import { describe, expect, test } from "vitest";

const built: string[] = [];
const RealFunction = globalThis.Function;
// a Function stand-in that records every attempt to build code from text (what a CSP without eval blocks)
const Spy = new Proxy(RealFunction, {
  construct(target, args: string[]) {
    built.push(args.join(","));
    return Reflect.construct(target, args) as object;
  },
  apply(target, thisArg, args: string[]) {
    built.push(args.join(","));
    return Reflect.apply(target, thisArg, args) as unknown;
  },
});

async function withSpy<T>(run: () => Promise<T>): Promise<T> {
  globalThis.Function = Spy;
  try {
    return await run();
  } finally {
    globalThis.Function = RealFunction;
  }
}

describe("zod in the browser: jitless, no eval", () => {
  test("after instrumentation-client.ts, zod is jitless and parsing the flow's state builds no function from text", async () => {
    await withSpy(async () => {
      await import("@/instrumentation-client");
      const { z } = await import("zod");
      expect(z.config().jitless).toBe(true);
      const { flowStateSchema } = await import("@/lib/flow/schema");
      const { defaultFlowState } = await import("@/lib/flow/defaults");
      for (let i = 0; i < 3; i++) expect(flowStateSchema.safeParse(defaultFlowState("header")).success).toBe(true);
      expect(flowStateSchema.safeParse({ kind: "nope" }).success).toBe(false);
    });
    expect(built).toEqual([]);
  });

  test("control: with the setting off, the same spy sees zod probe for eval and compile a parser", async () => {
    const { z } = await import("zod");
    z.config({ jitless: false });
    try {
      await withSpy(async () => {
        const schema = z.object({ spanFt: z.number(), kind: z.string() });
        for (let i = 0; i < 3; i++) expect(schema.safeParse({ spanFt: 12, kind: "header" }).success).toBe(true);
      });
    } finally {
      z.config({ jitless: true });
    }
    expect(built.length).toBeGreaterThan(0);
  });
});
