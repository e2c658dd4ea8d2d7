import type { AddressInfo } from "node:net";
import { SMTPServer } from "smtp-server";
import { afterAll, beforeAll, beforeEach, describe, expect, test, vi } from "vitest";
import { TEST_DB, asSessionUser, makeAccount, makeJob } from "../crew/fixtures";
import { who } from "../support/session-mock";

// The order list e-mailed through a real SMTP conversation: smtp-server runs inside this process as the
// mail sink, nodemailer (lib/mail) talks to it, and the raw message is read back.

vi.mock("@/lib/auth/session", () => import("../support/session-mock"));

const received: string[] = [];
const server = new SMTPServer({
  disabledCommands: ["STARTTLS", "AUTH"],
  onData(stream, _session, callback) {
    let data = "";
    stream.on("data", (chunk: Buffer) => (data += chunk.toString("utf8")));
    stream.on("end", () => {
      received.push(data);
      callback();
    });
  },
});

beforeAll(async () => {
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  process.env.SMTP_HOST = "127.0.0.1";
  process.env.SMTP_PORT = String((server.server.address() as AddressInfo).port);
  const { resetMailTransport } = await import("@/lib/mail");
  resetMailTransport();
});

afterAll(async () => {
  const { resetMailTransport } = await import("@/lib/mail");
  resetMailTransport();
  await new Promise<void>((resolve) => server.close(() => resolve()));
});

beforeEach(() => {
  who.current = null;
  received.length = 0;
});

describe.skipIf(!TEST_DB)("e-mail the order list", () => {
  test("the owner sends it to an address they type: the lines in the body, CSV and PDF attached", async () => {
    const { emailOrderList } = await import("@/components/orders/actions");
    const owner = await makeAccount("builder", "order");
    const { job } = await makeJob(owner.id);
    who.current = asSessionUser(owner);
    const result = await emailOrderList({ jobId: job.id, to: "Orders@Yard.example", note: "Deliver Tuesday" });
    expect(result).toEqual({ ok: true, sentTo: "orders@yard.example" });
    expect(received).toHaveLength(1);
    const raw = received[0];
    expect(raw).toContain("To: orders@yard.example");
    expect(raw).toMatch(/Subject: Lumber order: Marsh Lane addition/);
    expect(raw).toContain("Deliver Tuesday");
    expect(raw).toMatch(/filename="?Marsh-Lane-addition-order\.csv/);
    expect(raw).toMatch(/filename="?Marsh-Lane-addition-order\.pdf/);
    expect(raw).toContain("application/pdf");
  });

  test("a bad address is a 400 naming the field, and nothing is sent; someone else's job is a 404", async () => {
    const { emailOrderList } = await import("@/components/orders/actions");
    const owner = await makeAccount("builder", "order");
    const other = await makeAccount("builder", "order");
    const { job } = await makeJob(owner.id);
    who.current = asSessionUser(owner);
    const bad = await emailOrderList({ jobId: job.id, to: "not an address" });
    expect(bad).toMatchObject({ ok: false, status: 400, issues: [{ path: "to" }] });
    who.current = asSessionUser(other);
    expect(await emailOrderList({ jobId: job.id, to: "orders@yard.example" })).toMatchObject({ ok: false, status: 404 });
    who.current = null;
    expect(await emailOrderList({ jobId: job.id, to: "orders@yard.example" })).toMatchObject({ ok: false, status: 401 });
    expect(received).toHaveLength(0);
  });
});
