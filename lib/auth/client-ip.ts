import { BlockList, isIP } from "node:net";

/**
 * The client's address, for per-client rate limits.
 *
 * Next.js hands route handlers and server actions no socket address (NextRequest.ip went in Next.js 15), and
 * its server fills X-Forwarded-For from the socket only when the request carries none — so that header is
 * whatever the client wrote. Spanlark's server (scripts/serve.mjs, what `npm start` runs) therefore stamps
 * each request with the socket's address in PEER_HEADER, replacing any copy the client sent, together with a
 * random token made at start-up and kept in this process's environment (PEER_TOKEN_ENV), so a stamp the
 * client forged never matches.
 *
 * The address used is the socket's. Only when the socket belongs to a proxy named in TRUSTED_PROXIES
 * (comma-separated addresses or CIDR ranges, e.g. "10.0.0.0/8, 127.0.0.1"; unset: none) is X-Forwarded-For
 * read, from the right, skipping the trusted proxies, and the first address not in the list is the client.
 * With no stamp (the development server, `next start` run by hand) no header is trusted and every client
 * shares one key, "unknown": stricter, never looser. The per-e-mail limits hold in every case.
 */

export const PEER_HEADER = "x-spanlark-peer";
export const PEER_TOKEN_ENV = "SPANLARK_PEER_TOKEN";
export const UNKNOWN_CLIENT = "unknown";

type HeaderSource = Headers | Record<string, string | string[] | undefined>;

function read(headers: HeaderSource, name: string): string | undefined {
  if (headers instanceof Headers) return headers.get(name) ?? undefined;
  const value = headers[name];
  return Array.isArray(value) ? value.join(",") : value;
}

/** "::ffff:203.0.113.9" → "203.0.113.9"; "[2001:db8::1]" → "2001:db8::1"; anything not an address → null. */
export function normaliseAddress(text: string | undefined): string | null {
  if (!text) return null;
  let address = text.trim();
  if (address.startsWith("[") && address.includes("]")) address = address.slice(1, address.indexOf("]"));
  const mapped = /^::ffff:(\d+\.\d+\.\d+\.\d+)$/i.exec(address);
  if (mapped) address = mapped[1];
  return isIP(address) ? address.toLowerCase() : null;
}

/** TRUSTED_PROXIES as a BlockList; throws naming an entry that is neither an address nor a CIDR range. */
export function parseTrustedProxies(text: string | undefined): BlockList {
  const list = new BlockList();
  for (const entry of (text ?? "")
    .split(",")
    .map((e) => e.trim())
    .filter(Boolean)) {
    const [addressText, bitsText, extra] = entry.split("/");
    const address = normaliseAddress(addressText);
    const family = address ? (isIP(address) === 6 ? "ipv6" : "ipv4") : null;
    if (!address || !family || extra !== undefined) throw new Error(`"${entry}" is not an IP address or CIDR range`);
    if (bitsText === undefined) {
      list.addAddress(address, family);
      continue;
    }
    const bits = Number(bitsText);
    if (!/^\d+$/.test(bitsText) || bits > (family === "ipv4" ? 32 : 128)) throw new Error(`"${entry}" has a bad prefix length`);
    list.addSubnet(address, bits, family);
  }
  return list;
}

function isTrusted(address: string, trusted: BlockList): boolean {
  return trusted.check(address, isIP(address) === 6 ? "ipv6" : "ipv4");
}

/**
 * The client behind `peer` (the socket's address): `peer` itself unless it is a trusted proxy; then the
 * rightmost X-Forwarded-For entry that is not a trusted proxy (entries to its left are the client's to write).
 * A malformed entry where the client should be stops the walk: the last trusted hop is used instead.
 */
export function resolveClientIp(peer: string, forwardedFor: string | undefined, trusted: BlockList): string {
  const socket = normaliseAddress(peer);
  if (!socket) return UNKNOWN_CLIENT;
  if (!isTrusted(socket, trusted)) return socket;
  let client = socket;
  const hops = (forwardedFor ?? "")
    .split(",")
    .map((h) => h.trim())
    .filter(Boolean);
  for (let i = hops.length - 1; i >= 0; i -= 1) {
    const hop = normaliseAddress(hops[i]);
    if (!hop) break;
    client = hop;
    if (!isTrusted(hop, trusted)) break;
  }
  return client;
}

let trustedCache: { text: string | undefined; list: BlockList } | undefined;

function trustedProxies(): BlockList {
  const text = process.env.TRUSTED_PROXIES;
  if (!trustedCache || trustedCache.text !== text) trustedCache = { text, list: parseTrustedProxies(text) };
  return trustedCache.list;
}

/** The socket address stamped by our server, or null when the request carries no genuine stamp. */
export function stampedPeer(headers: HeaderSource): string | null {
  const token = process.env[PEER_TOKEN_ENV];
  const stamp = read(headers, PEER_HEADER);
  if (!token || !stamp) return null;
  const space = stamp.indexOf(" ");
  if (space < 0 || stamp.slice(0, space) !== token) return null;
  return stamp.slice(space + 1);
}

/** The client's address for per-client rate limits (see the top of this file). */
export function clientIp(headers: HeaderSource): string {
  const peer = stampedPeer(headers);
  if (peer === null) return UNKNOWN_CLIENT;
  return resolveClientIp(peer, read(headers, "x-forwarded-for"), trustedProxies()).slice(0, 64);
}
