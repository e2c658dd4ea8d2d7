import { mkdtemp, rm } from "node:fs/promises";
import { networkInterfaces, tmpdir } from "node:os";
import path from "node:path";
import { afterAll, describe, expect, test } from "vitest";
import { startStandinServer } from "@/scripts/stripe-standin/server";
import { stripeFor } from "../../payments/support";

// The stand-in as a process: state kept in a file across restarts, and test controls for loopback only.
describe("stand-in server", () => {
  const dirs: string[] = [];
  afterAll(async () => {
    await Promise.all(dirs.map((d) => rm(d, { recursive: true, force: true })));
  });

  test("with a state file, objects survive a restart", async () => {
    const dir = await mkdtemp(path.join(tmpdir(), "standin-"));
    dirs.push(dir);
    const statePath = path.join(dir, "state.json");
    const first = await startStandinServer({ port: 0, webhookUrl: "", webhookSecret: "whsec_x", statePath });
    const product = await stripeFor(first.url).products.create({ name: "Kept across restarts" });
    await first.close();

    const second = await startStandinServer({ port: 0, webhookUrl: "", webhookSecret: "whsec_x", statePath });
    try {
      expect((await stripeFor(second.url).products.retrieve(product.id)).name).toBe("Kept across restarts");
    } finally {
      await second.close();
    }
  });

  test("without a state file, a restart starts empty", async () => {
    const first = await startStandinServer({ port: 0, webhookUrl: "", webhookSecret: "whsec_x" });
    const product = await stripeFor(first.url).products.create({ name: "Forgotten" });
    await first.close();
    const second = await startStandinServer({ port: 0, webhookUrl: "", webhookSecret: "whsec_x" });
    try {
      await expect(stripeFor(second.url).products.retrieve(product.id)).rejects.toMatchObject({ statusCode: 404 });
    } finally {
      await second.close();
    }
  });

  test("reset empties the state; unknown API paths are Stripe-shaped 404s", async () => {
    const standin = await startStandinServer({ port: 0, webhookUrl: "", webhookSecret: "whsec_x" });
    try {
      const stripe = stripeFor(standin.url);
      await stripe.products.create({ name: "Gone after reset" });
      expect((await fetch(`${standin.url}/_control/reset`, { method: "POST" })).status).toBe(200);
      expect((await stripe.products.list()).data).toEqual([]);
      const res = await fetch(`${standin.url}/v1/coupons`, { headers: { authorization: "Bearer sk_test_x" } });
      expect(res.status).toBe(404);
      expect(await res.json()).toMatchObject({ error: { type: "invalid_request_error", message: "Unrecognized request URL (GET: /v1/coupons)." } });
    } finally {
      await standin.close();
    }
  });

  const external = Object.values(networkInterfaces())
    .flat()
    .find((i) => i && i.family === "IPv4" && !i.internal)?.address;

  test.skipIf(!external)("the control endpoints refuse a caller from another address (403), the API does not", async () => {
    const standin = await startStandinServer({ port: 0, host: "0.0.0.0", webhookUrl: "", webhookSecret: "whsec_x" });
    try {
      const port = new URL(standin.url).port;
      const remote = `http://${external}:${port}`;
      expect((await fetch(`${remote}/_control/reset`, { method: "POST" })).status).toBe(403);
      expect((await fetch(`http://127.0.0.1:${port}/_control/health`)).status).toBe(200);
      expect((await fetch(`${remote}/v1/products`, { headers: { authorization: "Bearer sk_test_x" } })).status).toBe(200);
    } finally {
      await standin.close();
    }
  });
});
