// @vitest-environment jsdom
// What the phone keeps of an answer worked out with no signal (components/offline/phone-answers.ts): it outlives a
// reload of the page (the module loaded afresh, as after one), is the server's to recheck for 15 minutes after the
// first server answer and then forgotten, and at most 24 requests are kept.
import { afterEach, describe, expect, test, vi } from "vitest";
import type { PhoneWorkedOut } from "@/lib/offline/answers";

const TABLES = { id: "v-demo", number: 6, publishedAt: "2026-12-02T00:00:00.000Z" };
const worked = (headline: string, at: number): PhoneWorkedOut => ({
  tables: TABLES,
  lines: [
    {
      headline,
      memberLabel: "2-ply 2x8 No.2 Douglas Fir-Larch",
      spec: { material: "sawn", species: "Douglas Fir-Larch", grade: "No.2", size: "2x8", plies: 2 } as never,
      ratio: 0.62,
      governing: "bending",
    },
  ],
  at,
});

async function freshModule() {
  vi.resetModules();
  return import("@/components/offline/phone-answers");
}

// The phone's clock is set for each step: what is kept is read back against Date.now() (two weeks at most), so
// a test with fixed dates must not depend on the day it runs.
afterEach(() => {
  localStorage.clear();
  vi.useRealTimers();
});

function clockAt(ms: number): number {
  vi.useFakeTimers({ toFake: ["Date"] });
  vi.setSystemTime(ms);
  return ms;
}

describe("answers worked out on the phone", () => {
  test("kept across a reload, rechecked once, shown again within 15 minutes, then forgotten", async () => {
    const t0 = clockAt(Date.parse("2026-12-04T09:00:00Z"));
    (await freshModule()).keepWorkedOut('{"lengthFt":6}', worked("2-ply 2x8 No.2, 1 jack stud each end", t0));
    const afterReload = await freshModule();
    expect(afterReload.rechecking('{"lengthFt":7}', clockAt(t0 + 1_000))).toBeNull();
    expect(afterReload.rechecking('{"lengthFt":6}', clockAt(t0 + 60_000))?.lines[0]?.headline).toBe("2-ply 2x8 No.2, 1 jack stud each end");
    // reloaded again 10 minutes after the recheck: still shown
    const again = await freshModule();
    expect(again.rechecking('{"lengthFt":6}', clockAt(t0 + 60_000 + 10 * 60_000))).not.toBeNull();
    // 16 minutes after the first recheck: an answer with a signal is no longer called a recheck
    expect(again.rechecking('{"lengthFt":6}', clockAt(t0 + 60_000 + 16 * 60_000))).toBeNull();
    expect((await freshModule()).rechecking('{"lengthFt":6}', clockAt(t0 + 60_000 + 17 * 60_000))).toBeNull();
  });

  test("an answer never rechecked is kept for two weeks, then forgotten", async () => {
    const t0 = clockAt(Date.parse("2026-12-04T09:00:00Z"));
    const day = 24 * 3600 * 1000;
    for (const [days, kept] of [
      [13, true],
      [15, false],
    ] as const) {
      localStorage.clear();
      clockAt(t0);
      (await freshModule()).keepWorkedOut('{"lengthFt":8}', worked("2-ply 2x10 No.2, 2 jack studs each end", t0));
      clockAt(t0 + days * day);
      const found = (await freshModule()).rechecking('{"lengthFt":8}');
      expect(found === null ? "forgotten" : "kept", `${days} days later`).toBe(kept ? "kept" : "forgotten");
    }
  });

  test("the latest 24 requests are kept; damaged storage is ignored", async () => {
    const m = await freshModule();
    const now = Date.now();
    for (let i = 0; i < 30; i += 1) m.keepWorkedOut(`{"lengthFt":${i}}`, worked(`answer ${i}`, now));
    const reloaded = await freshModule();
    expect(reloaded.rechecking('{"lengthFt":5}', now)).toBeNull();
    expect(reloaded.rechecking('{"lengthFt":6}', now)?.lines[0]?.headline).toBe("answer 6");
    expect(reloaded.rechecking('{"lengthFt":29}', now)?.lines[0]?.headline).toBe("answer 29");
    localStorage.setItem("spanlark-phone-answers", "{not json");
    expect((await freshModule()).rechecking('{"lengthFt":29}', now)).toBeNull();
  });
});
