import NextAuth from "next-auth";
import { NextRequest } from "next/server";
import { authOptions } from "@/app/(auth)/auth";
import { appOrigin } from "@/lib/env";
import { AppError, errorResponse } from "@/lib/server/errors";
import { readBodyText, unstorableText } from "@/lib/server/input";
import { currentSession, sessionCookieName } from "@/lib/server/session";

const handler = NextAuth(authOptions);

type Ctx = { params: Promise<{ nextauth?: string[] }> };

/** The sign-in and sign-out forms are a few hundred bytes. */
const FORM_LIMIT = 16 * 1024;

/**
 * The session as the browser's session provider asks for it, answered from the database: a revoked
 * session (signed out, account disabled, role changed) answers {} and the cookie is cleared, and a
 * live one gives the user's current name and role. Sessions last 12 hours from sign-in.
 */
async function sessionAnswer(): Promise<Response> {
  const live = await currentSession();
  const headers = new Headers({ "cache-control": "private, no-cache, no-store" });
  if (!live) {
    const secure = appOrigin().startsWith("https:") ? "; Secure" : "";
    headers.append("set-cookie", `${sessionCookieName()}=; Path=/; Max-Age=0; HttpOnly; SameSite=Lax${secure}`);
    return Response.json({}, { headers });
  }
  return Response.json({ user: live.user, expires: live.expiresAt.toISOString() }, { headers });
}

export async function GET(req: NextRequest, ctx: Ctx) {
  try {
    const [action] = (await ctx.params).nextauth ?? [];
    if (action === "session") return await sessionAnswer();
    return await handler(req, ctx);
  } catch (err) {
    return errorResponse(err);
  }
}

/**
 * next-auth's own client posts url-encoded forms. Anything else (a JSON body, which next-auth would
 * parse and crash on, or a huge or broken form) is refused here in our words.
 */
export async function POST(req: NextRequest, ctx: Ctx) {
  try {
    const type = req.headers.get("content-type")?.split(";")[0]?.trim().toLowerCase();
    if (type !== "application/x-www-form-urlencoded") {
      throw new AppError("unsupported_media_type", "Send this form as application/x-www-form-urlencoded, as Stopwright's sign-in page does.");
    }
    const text = await readBodyText(req, FORM_LIMIT);
    for (const [name, value] of new URLSearchParams(text)) {
      const problem = unstorableText(name) ?? unstorableText(value);
      if (problem) throw new AppError("bad_request", `The form field ${JSON.stringify(name.slice(0, 40))} ${problem}`);
    }
    const copy = new NextRequest(req.url, { method: "POST", headers: req.headers, body: text });
    return await handler(copy, ctx);
  } catch (err) {
    return errorResponse(err);
  }
}
