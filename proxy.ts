import { withAuth, type NextRequestWithAuth } from "next-auth/middleware";
import { NextResponse, type NextFetchEvent } from "next/server";
import { appOrigin } from "@/lib/env";
import { changesState, foreignOriginProblem } from "@/lib/server/request-checks";

const signedIn = withAuth({ pages: { signIn: "/sign-in" } });

/**
 * A convenience in front of the app; every page, route handler and server action checks the session
 * and the origin itself. Here a change posted from another site (a server action included, which the
 * framework would otherwise answer with a crash) gets a plain 403, and signed-out visitors of a page
 * go to the sign-in page.
 */
export default function proxy(req: NextRequestWithAuth, event: NextFetchEvent) {
  if (changesState(req.method)) {
    const problem = foreignOriginProblem(req.headers, appOrigin());
    if (problem) return NextResponse.json({ error: { code: "forbidden", message: problem } }, { status: 403 });
  }
  const path = req.nextUrl.pathname;
  // API routes answer 401 themselves; the sign-in page and invitation links stay public.
  if (path.startsWith("/api/") || path === "/sign-in" || path.startsWith("/invite/")) return NextResponse.next();
  return signedIn(req, event);
}

export const config = {
  matcher: ["/((?!_next/static|_next/image|favicon.svg|.*\\.woff2$).*)"],
};
