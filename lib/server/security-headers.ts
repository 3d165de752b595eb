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
  /** Object storage the browser talks to directly (uploads PUT there, files and thumbnails load from there). */
  storage?: readonly string[];
};

/**
 * The origins of the object storage behind signed file links: the configured endpoint (the bucket
 * as a sub-domain unless path-style), or AWS's regional S3 addresses when no endpoint is set.
 */
export function storageOrigins(s: { endpoint?: string; bucket?: string; region: string; forcePathStyle: boolean }): string[] {
  if (s.endpoint) {
    const url = new URL(s.endpoint);
    const origins = [url.origin];
    if (!s.forcePathStyle && s.bucket) origins.push(`${url.protocol}//${s.bucket}.${url.host}`);
    return origins;
  }
  const host = `s3.${s.region}.amazonaws.com`;
  return [`https://${host}`, ...(s.bucket ? [`https://${s.bucket}.${host}`] : [])];
}

export function contentSecurityPolicy({ nonce, https, dev, storage = [] }: HeaderOptions): string {
  const files = storage.length ? ` ${storage.join(" ")}` : "";
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    // The editor's estimate worker is one of our own static chunks; without this the worker would
    // fall under script-src, where 'strict-dynamic' ignores 'self' and refuses it.
    "worker-src 'self'",
    "style-src 'self' 'unsafe-inline'",
    `img-src 'self' data: blob:${files}`,
    `media-src 'self'${files}`,
    "font-src 'self'",
    `connect-src 'self'${files}`,
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
