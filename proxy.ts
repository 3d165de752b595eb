import { getToken } from "next-auth/jwt";
import { NextResponse, type NextRequest } from "next/server";
import { appOrigin, authSecret, env, isDevelopment } from "@/lib/env";
import { changesState, foreignOriginProblem } from "@/lib/server/request-checks";
import { newNonce, securityHeaders, staticSecurityHeaders, storageOrigins } from "@/lib/server/security-headers";

/** Framework files and fonts: fixed content, no scripts of ours to protect with a nonce. */
function isStaticAsset(path: string): boolean {
  return path.startsWith("/_next/static/") || path.startsWith("/_next/image") || path === "/favicon.svg" || path.endsWith(".woff2");
}

function withHeaders(res: NextResponse, headers: Record<string, string>): NextResponse {
  for (const [k, v] of Object.entries(headers)) res.headers.set(k, v);
  return res;
}

function refuse(path: string, status: number, code: string, message: string, headers: Record<string, string>): NextResponse {
  const res = path.startsWith("/api/")
    ? NextResponse.json({ error: { code, message } }, { status })
    : new NextResponse(message, { status, headers: { "content-type": "text/plain; charset=utf-8" } });
  return withHeaders(res, headers);
}

/**
 * In front of every request. Every page, route handler and server action checks the session and
 * the origin itself; here:
 * - an address with broken %-encoding gets a 400 (the router would otherwise crash on it);
 * - a change posted from another site (a server action included, which the framework would
 *   otherwise answer with a crash) gets a plain 403;
 * - each answer gets the security headers, and each page a fresh script nonce, which the framework
 *   reads from the request's Content-Security-Policy and puts on its own scripts;
 * - signed-out visitors of a page go to the sign-in page.
 */
export default async function proxy(req: NextRequest) {
  const path = req.nextUrl.pathname;
  const https = appOrigin().startsWith("https:");
  if (isStaticAsset(path)) return withHeaders(NextResponse.next(), staticSecurityHeaders({ https }));

  const nonce = newNonce();
  const s = env();
  const storage = storageOrigins({ endpoint: s.S3_ENDPOINT, bucket: s.S3_BUCKET, region: s.S3_REGION, forcePathStyle: s.S3_FORCE_PATH_STYLE });
  const headers = securityHeaders({ nonce, https, dev: isDevelopment(), storage });
  try {
    decodeURIComponent(path);
  } catch {
    return refuse(path, 400, "bad_request", "This address is not valid: it has a broken %-escape.", headers);
  }
  if (changesState(req.method)) {
    const problem = foreignOriginProblem(req.headers, appOrigin());
    if (problem) return refuse(path, 403, "forbidden", problem, headers);
  }

  // API routes answer 401 themselves; the sign-in page and invitation links stay public.
  if (!path.startsWith("/api/") && path !== "/sign-in" && !path.startsWith("/invite/")) {
    const token = await getToken({ req, secret: authSecret(), secureCookie: https });
    if (!token) {
      const signIn = new URL("/sign-in", appOrigin());
      signIn.searchParams.set("callbackUrl", `${path}${req.nextUrl.search}`);
      return withHeaders(NextResponse.redirect(signIn), headers);
    }
  }

  const requestHeaders = new Headers(req.headers);
  requestHeaders.set("content-security-policy", headers["content-security-policy"]!);
  return withHeaders(NextResponse.next({ request: { headers: requestHeaders } }), headers);
}

export const config = {
  matcher: ["/:path*"],
};
