// The Content-Security-Policy, set per response by proxy.ts. Scripts run only from our own origin or with this
// response's nonce (Next.js puts the nonce on its inline bootstrap scripts when it finds it in the request's
// CSP header); no inline script without it. Inline styles stay allowed (React's style attributes); everything
// is same-origin, nothing is loaded from another host.

/** A fresh nonce: 16 random bytes in base64. */
export function makeNonce(): string {
  const bytes = new Uint8Array(16);
  crypto.getRandomValues(bytes);
  return btoa(String.fromCharCode(...bytes));
}

export function contentSecurityPolicy(nonce: string, { dev = process.env.NODE_ENV !== "production" } = {}): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "frame-ancestors 'none'",
    "base-uri 'self'",
    "object-src 'none'",
    "form-action 'self'",
  ].join("; ");
}
