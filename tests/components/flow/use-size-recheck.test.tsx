// @vitest-environment jsdom
// The sizing hook with no signal and as the signal returns: the phone works the answer out with the tables kept
// on it, and once online the server is asked again until it has answered, even when the first request as the
// signal returns is lost or refused. The server is played by msw answering with the same sizeMember the route
// runs, on the starter tables.
import { act, cleanup, render, screen, waitFor } from "@testing-library/react";
import { http, HttpResponse } from "msw";
import { setupServer } from "msw/node";
import { afterAll, afterEach, beforeAll, describe, expect, test, vi } from "vitest";
import { SWRConfig } from "swr";
import { useSize } from "@/components/flow/use-design";
import { forgetWorkedOut } from "@/components/offline/phone-answers";
import { defaultFlowState } from "@/lib/flow/defaults";
import { sizeMember } from "@/lib/solver/design";
import { STARTER_TABLES } from "@/lib/tables";

const STAMP = { id: STARTER_TABLES.version, number: null, publishedAt: null };
vi.mock("@/components/offline/phone-tables", () => ({
  readPhoneTables: async () => ({ stamp: STAMP, tables: STARTER_TABLES, checkedAt: new Date(0).toISOString() }),
  refreshPhoneTables: async () => ({ stamp: STAMP, tables: STARTER_TABLES, checkedAt: new Date(0).toISOString() }),
}));

let online = false;
/** what the server does with each request, in turn; the last one repeats */
let plan: ("lost" | "refused" | "answer")[] = [];
let asked = 0;
const server = setupServer(
  http.post("*/api/size", async ({ request }) => {
    if (!online) return HttpResponse.error();
    const step = plan[Math.min(asked, plan.length - 1)];
    asked += 1;
    if (step === "lost") return HttpResponse.error();
    if (step === "refused") return HttpResponse.json({ error: "The database is not answering; try again in a moment" }, { status: 503 });
    return HttpResponse.json(sizeMember(await request.json(), STARTER_TABLES));
  }),
);

beforeAll(() => {
  server.listen({ onUnhandledRequest: "error" });
  // msw's fetch, taken after listen() has put it in place
  const intercepted = globalThis.fetch;
  Object.defineProperty(window.navigator, "onLine", { configurable: true, get: () => online });
  // the page's relative URLs, as a browser resolves them
  vi.stubGlobal("fetch", (input: string | URL | Request, init?: RequestInit) =>
    intercepted(typeof input === "string" ? new URL(input, window.location.href) : input, init),
  );
});
afterEach(() => {
  cleanup();
  forgetWorkedOut();
  asked = 0;
});
afterAll(() => {
  server.close();
  vi.unstubAllGlobals();
});

function Where() {
  const size = useSize({ ...defaultFlowState("header") });
  const d = size.data;
  const where = !d ? "none" : d.onPhone ? "on the phone" : d.replaced ? "rechecked by the server" : "server";
  return <p data-testid="where">{where}</p>;
}

async function phoneThenOnline(steps: typeof plan): Promise<void> {
  online = false;
  plan = steps;
  render(
    // a cache of its own per test, as a fresh page has
    <SWRConfig value={{ provider: () => new Map() }}>
      <Where />
    </SWRConfig>,
  );
  await waitFor(() => expect(screen.getByTestId("where").textContent).toBe("on the phone"), { timeout: 3_000 });
  online = true;
  act(() => {
    window.dispatchEvent(new Event("online"));
  });
}

describe("useSize as the signal returns", () => {
  test("the server answers at once: the phone's answer is rechecked", async () => {
    await phoneThenOnline(["answer"]);
    await waitFor(() => expect(screen.getByTestId("where").textContent).toBe("rechecked by the server"), { timeout: 3_000 });
  });

  test("the first request is lost: asked again within seconds, not left on the phone's answer", async () => {
    await phoneThenOnline(["lost", "answer"]);
    await waitFor(() => expect(screen.getByTestId("where").textContent).toBe("rechecked by the server"), { timeout: 8_000 });
    expect(asked).toBe(2);
  }, 15_000);

  test("the first request is refused (503): asked again", async () => {
    await phoneThenOnline(["refused", "answer"]);
    await waitFor(() => expect(screen.getByTestId("where").textContent).toBe("rechecked by the server"), { timeout: 8_000 });
    expect(asked).toBe(2);
  }, 15_000);

  test("connected but nothing gets through: asked again at a slowing pace, not in a loop", async () => {
    await phoneThenOnline(["lost"]);
    await new Promise((resolve) => setTimeout(resolve, 6_500));
    // at once, then 5 s later (the next is 10 s after that)
    expect(asked).toBe(2);
    expect(screen.getByTestId("where").textContent).toBe("on the phone");
  }, 15_000);
});
