type HeaderSource = Headers | Record<string, string | string[] | undefined>;

function read(headers: HeaderSource, name: string): string | undefined {
  if (headers instanceof Headers) return headers.get(name) ?? undefined;
  const value = headers[name];
  return Array.isArray(value) ? value.join(",") : value;
}

/**
 * The client's address for per-client rate limits: the last X-Forwarded-For entry, the one added by the
 * nearest proxy. Next.js fills the header from the socket only when the request has none, so in production
 * run behind a proxy that appends to it; the per-e-mail limits hold whatever a client sends.
 */
export function clientIp(headers: HeaderSource): string {
  const forwarded = read(headers, "x-forwarded-for");
  const last = forwarded
    ?.split(",")
    .map((part) => part.trim())
    .filter(Boolean)
    .at(-1);
  return (last ?? read(headers, "x-real-ip") ?? "unknown").slice(0, 64);
}
