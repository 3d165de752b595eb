import { withAuth } from "next-auth/middleware";

// A convenience only: every page, route handler and server action checks the session itself.
export default withAuth({ pages: { signIn: "/sign-in" } });

export const config = {
  // API routes answer 401 themselves; sign-in, fonts and static files stay public.
  matcher: ["/((?!api|sign-in|_next/static|_next/image|favicon.svg|.*\\.woff2$).*)"],
};
