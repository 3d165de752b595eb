/**
 * The headers every answer carries, set in one place (proxy.ts). Scripts run only with the nonce
 * of their own response ('strict-dynamic' lets the framework's nonce'd loader bring in its chunks),
 * so no inline script of anyone else's runs; styles allow inline `style` attributes, which React
 * and the drag-and-drop board write and which carry no script. Pure.
 */

export type HeaderOptions = {
  /** Base64 nonce for this response's scripts. */
  nonce: string;
  /** The app is served over HTTPS (NEXTAUTH_URL says so): add HSTS and upgrade stray http links. */
  https: boolean;
  /** Development server: React's dev tools evaluate code, so 'unsafe-eval' is allowed there only. */
  dev: boolean;
};

export function contentSecurityPolicy({ nonce, https, dev }: HeaderOptions): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-src 'none'",
    "frame-ancestors 'none'",
    ...(https ? ["upgrade-insecure-requests"] : []),
  ].join("; ");
}

/** Headers without a nonce, for every answer (static files included). */
export function staticSecurityHeaders({ https }: Pick<HeaderOptions, "https">): Record<string, string> {
  return {
    "x-content-type-options": "nosniff",
    // Project and scheme ids are in our URLs; other sites are not told them.
    "referrer-policy": "same-origin",
    "x-frame-options": "DENY",
    "permissions-policy": "camera=(), microphone=(), geolocation=(), payment=(), usb=(), browsing-topics=()",
    "cross-origin-opener-policy": "same-origin",
    "cross-origin-resource-policy": "same-origin",
    // Two years, the value hstspreload.org asks for; only when the app is served over HTTPS.
    ...(https ? { "strict-transport-security": "max-age=63072000; includeSubDomains" } : {}),
  };
}

export function securityHeaders(opts: HeaderOptions): Record<string, string> {
  return { ...staticSecurityHeaders(opts), "content-security-policy": contentSecurityPolicy(opts) };
}

/** 128 random bits, base64: a fresh nonce for one response. */
export function newNonce(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return btoa(String.fromCharCode(...bytes));
}
