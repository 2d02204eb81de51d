// Headers every response carries (src/proxy.ts). Sources: OWASP Secure Headers Project and HTTP
// Headers Cheat Sheet; MDN CSP "strict-dynamic" with nonces; Next.js guide "Content Security Policy".

/** A fresh base64 nonce per response (128 bits from the platform CSPRNG). */
export function newNonce(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return btoa(String.fromCharCode(...bytes));
}

/**
 * Scripts run only with this response's nonce (Next puts it on its own inline and chunk scripts) or
 * when loaded by one that has it ('strict-dynamic'). Styles allow inline attributes: React and the
 * charts set style="…" and a style cannot run code. Dev mode adds 'unsafe-eval' for React's debugging.
 */
export function contentSecurityPolicy(nonce: string, { dev = false }: { dev?: boolean } = {}): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    // The floor's service worker (/sw.js); without this, worker-src falls back to script-src, whose
    // 'strict-dynamic' ignores 'self'.
    "worker-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

export function securityHeaders({ csp, https }: { csp: string; https: boolean }): Array<[string, string]> {
  const headers: Array<[string, string]> = [
    ["content-security-policy", csp],
    ["x-content-type-options", "nosniff"],
    // Reset and invitation tokens sit in paths: never send them to another site.
    ["referrer-policy", "no-referrer"],
    ["x-frame-options", "DENY"],
    ["permissions-policy", "camera=(self), microphone=(), geolocation=(), payment=(), usb=(), interest-cohort=()"],
    ["cross-origin-opener-policy", "same-origin"],
  ];
  // Over plain http (a shop LAN, local development) HSTS is ignored by browsers and would only mislead.
  if (https) headers.push(["strict-transport-security", "max-age=31536000; includeSubDomains"]);
  return headers;
}
