import { createServer, request, type IncomingMessage } from "node:http";
import { afterEach, describe, expect, test } from "vitest";
import { clientIp, parseTrustedProxies, PEER_HEADER, PEER_TOKEN_ENV, resolveClientIp, UNKNOWN_CLIENT } from "@/lib/auth/client-ip";

// Which address the per-client rate limits count. X-Forwarded-For semantics: MDN "X-Forwarded-For" (each
// proxy appends the address it received the request from; only entries added by trusted proxies can be
// believed, read from the right) — common practice.

const NONE = parseTrustedProxies("");
const LB = parseTrustedProxies("10.0.0.0/8, 192.0.2.1, ::1");

describe("resolveClientIp", () => {
  test.each([
    ["no trusted proxies: the socket, whatever the header says", "203.0.113.9", "198.51.100.1, 198.51.100.2", NONE, "203.0.113.9"],
    ["no trusted proxies, no header", "203.0.113.9", undefined, NONE, "203.0.113.9"],
    ["a socket that is not a trusted proxy is the client, header ignored", "203.0.113.9", "198.51.100.1", LB, "203.0.113.9"],
    ["behind one trusted proxy: the entry it appended", "10.1.2.3", "198.51.100.7", LB, "198.51.100.7"],
    ["a forged entry to the left of the real one is not believed", "10.1.2.3", "1.2.3.4, 198.51.100.7", LB, "198.51.100.7"],
    ["two trusted proxies: skip both", "10.1.2.3", "198.51.100.7, 192.0.2.1", LB, "198.51.100.7"],
    ["trusted proxy and no header: the proxy itself", "10.1.2.3", undefined, LB, "10.1.2.3"],
    ["garbage where the client should be: the last trusted hop", "10.1.2.3", "not-an-ip", LB, "10.1.2.3"],
    ["IPv4-mapped IPv6 socket address", "::ffff:203.0.113.9", "198.51.100.1", NONE, "203.0.113.9"],
    ["IPv6 trusted proxy", "::1", "2001:db8::5", LB, "2001:db8::5"],
    ["no socket address", "", "198.51.100.1", LB, UNKNOWN_CLIENT],
  ])("%s", (_label, peer, xff, trusted, expected) => {
    expect(resolveClientIp(peer, xff, trusted)).toBe(expected);
  });
});

describe("parseTrustedProxies", () => {
  test("addresses and CIDR ranges", () => {
    const list = parseTrustedProxies("10.0.0.0/8,127.0.0.1, 2001:db8::/32");
    expect(list.check("10.200.0.1", "ipv4")).toBe(true);
    expect(list.check("11.0.0.1", "ipv4")).toBe(false);
    expect(list.check("127.0.0.1", "ipv4")).toBe(true);
    expect(list.check("2001:db8:1::1", "ipv6")).toBe(true);
  });
  test.each(["localhost", "10.0.0.0/33", "10.0.0.1/8/1", "1.2.3"])("refuses %j", (entry) => {
    expect(() => parseTrustedProxies(entry)).toThrow(/not an IP address|prefix/);
  });
});

describe("clientIp reads only a genuine stamp", () => {
  const saved = { token: process.env[PEER_TOKEN_ENV], trusted: process.env.TRUSTED_PROXIES };
  afterEach(() => {
    if (saved.token === undefined) delete process.env[PEER_TOKEN_ENV];
    else process.env[PEER_TOKEN_ENV] = saved.token;
    if (saved.trusted === undefined) delete process.env.TRUSTED_PROXIES;
    else process.env.TRUSTED_PROXIES = saved.trusted;
  });

  test("no stamp (not behind scripts/serve.mjs): no header is believed", () => {
    delete process.env[PEER_TOKEN_ENV];
    expect(clientIp(new Headers({ "x-forwarded-for": "198.51.100.1", "x-real-ip": "198.51.100.2" }))).toBe(UNKNOWN_CLIENT);
  });

  test("a forged stamp is ignored", () => {
    process.env[PEER_TOKEN_ENV] = "real-token";
    expect(clientIp(new Headers({ [PEER_HEADER]: "guessed 198.51.100.1" }))).toBe(UNKNOWN_CLIENT);
  });

  test("a genuine stamp gives the socket; X-Forwarded-For counts only from a configured proxy", () => {
    process.env[PEER_TOKEN_ENV] = "real-token";
    delete process.env.TRUSTED_PROXIES;
    const headers = { [PEER_HEADER]: "real-token 127.0.0.1", "x-forwarded-for": "198.51.100.1" };
    expect(clientIp(headers)).toBe("127.0.0.1");
    process.env.TRUSTED_PROXIES = "127.0.0.1";
    expect(clientIp(headers)).toBe("198.51.100.1");
  });

  test("rotating X-Forwarded-For from one socket gives one key", () => {
    process.env[PEER_TOKEN_ENV] = "real-token";
    delete process.env.TRUSTED_PROXIES;
    const keys = new Set(Array.from({ length: 20 }, (_, i) => clientIp({ [PEER_HEADER]: "real-token 203.0.113.9", "x-forwarded-for": `198.51.100.${i}` })));
    expect([...keys]).toEqual(["203.0.113.9"]);
  });
});

describe("the stamp scripts/serve.mjs puts on a real socket", () => {
  // The same two lines as the server's request listener, on a real loopback connection with a forged stamp.
  test("replaces a client's forged copy with the socket's address", async () => {
    const token = "serve-token";
    const seen: string[] = [];
    const server = createServer((req: IncomingMessage, res) => {
      req.headers[PEER_HEADER] = `${token} ${req.socket.remoteAddress ?? ""}`;
      process.env[PEER_TOKEN_ENV] = token;
      seen.push(clientIp(req.headers));
      res.end("ok");
    });
    await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
    const { port } = server.address() as { port: number };
    try {
      await new Promise<void>((resolve, reject) => {
        const req = request(
          { host: "127.0.0.1", port, localAddress: "127.0.0.3", headers: { [PEER_HEADER]: `${token} 198.51.100.66`, "x-forwarded-for": "198.51.100.67" } },
          (res) => res.resume().on("end", resolve),
        );
        req.on("error", reject);
        req.end();
      });
    } finally {
      server.close();
    }
    expect(seen).toEqual(["127.0.0.3"]);
  });
});
