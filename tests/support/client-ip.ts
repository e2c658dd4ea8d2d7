import { PEER_HEADER, PEER_TOKEN_ENV } from "@/lib/auth/client-ip";

/**
 * Headers that make an in-process request come from `ip`, as scripts/serve.mjs stamps a real one with its
 * socket's address (route handlers called directly have no socket).
 */
export function fromClient(ip: string): Record<string, string> {
  process.env[PEER_TOKEN_ENV] ??= "vitest-peer-token";
  return { [PEER_HEADER]: `${process.env[PEER_TOKEN_ENV]} ${ip}` };
}
