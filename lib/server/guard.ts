import "server-only";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import type { z } from "zod";
import "@/lib/validation/messages";
import { can, roleLabels, type Permission, type Role } from "@/lib/roles";
import { appOrigin } from "@/lib/env";
import { AppError, errorResponse, invalid, toErrorBody, type FieldErrors } from "./errors";
import { assertStorable, readJsonBody } from "./input";
import { currentSession } from "./session";
import { assertJsonBody, assertSameOrigin, foreignOriginProblem } from "./request-checks";

export type SessionUser = { id: string; email: string; name: string; role: Role };

/**
 * The signed-in user as the database knows them now: a session revoked by signing out, by
 * disabling the account or by a change of role ends on the next request, not when its token expires.
 */
export async function currentUser(): Promise<SessionUser | null> {
  return (await currentSession())?.user ?? null;
}

export async function requireUser(permission?: Permission): Promise<SessionUser> {
  const user = await currentUser();
  if (!user) throw new AppError("unauthenticated", "Sign in to continue.");
  if (permission && !can(user.role, permission)) {
    throw new AppError("forbidden", `The ${roleLabels[user.role]} role may not do this (${permission}).`);
  }
  return user;
}

/** For server components: signed-out visitors go to sign-in, a wrong role sees the refusal page. */
export async function requirePageUser(permission?: Permission, callbackUrl = "/"): Promise<SessionUser> {
  const user = await currentUser();
  if (!user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(callbackUrl)}`);
  if (permission && !can(user.role, permission)) redirect(`/forbidden?need=${encodeURIComponent(permission)}`);
  return user;
}

type RouteArgs<B, P> = { user: SessionUser; body: B; params: P; req: Request; url: URL };
type Output<S, Fallback> = S extends z.ZodType ? z.output<S> : Fallback;

/** A path parameter that fails its schema names nothing: 404 with the schema's words. */
function parseParams<P extends z.ZodType>(schema: P, raw: unknown): z.output<P> {
  const parsed = schema.safeParse(raw ?? {});
  if (!parsed.success) throw new AppError("not_found", parsed.error.issues[0]?.message ?? "No such page.");
  return parsed.data;
}

/**
 * Wraps a route handler: refuse changes from other sites, authenticate, check the role, validate
 * the path parameters (404), read the JSON body within its size limit and parse it with zod (422
 * with every field path), then act. Errors become JSON with a typed code; no stack trace reaches a
 * client. Authentication comes before parsing so an anonymous caller learns nothing about the API.
 */
export function route<S extends z.ZodType | undefined = undefined, PS extends z.ZodType | undefined = undefined>(
  opts: { permission: Permission; body?: S; params?: PS; bodyLimit?: number },
  fn: (args: RouteArgs<Output<S, undefined>, Output<PS, Record<string, string>>>) => Promise<unknown>,
) {
  return async (req: Request, ctx: { params: Promise<unknown> }): Promise<Response> => {
    try {
      assertSameOrigin(req, appOrigin());
      const user = await requireUser(opts.permission);
      const rawParams = (await ctx?.params) ?? {};
      const params = opts.params ? parseParams(opts.params, rawParams) : rawParams;
      let body: unknown = undefined;
      if (opts.body) {
        assertJsonBody(req);
        const parsed = opts.body.safeParse(await readJsonBody(req, opts.bodyLimit));
        if (!parsed.success) throw invalid(parsed.error);
        body = parsed.data;
      }
      const result = await fn({ user, body: body as never, params: params as never, req, url: new URL(req.url) });
      if (result instanceof Response) return result;
      return Response.json(result ?? { ok: true });
    } catch (err) {
      return errorResponse(err);
    }
  };
}

/**
 * For the few handlers a signed-out visitor may call (accepting an invitation): the same origin and
 * body checks, zod parsing and typed errors as route(), without a session.
 */
export function publicRoute<S extends z.ZodType>(opts: { body: S }, fn: (args: { body: z.output<S>; req: Request }) => Promise<unknown>) {
  return async (req: Request): Promise<Response> => {
    try {
      assertSameOrigin(req, appOrigin());
      assertJsonBody(req);
      const parsed = opts.body.safeParse(await readJsonBody(req));
      if (!parsed.success) throw invalid(parsed.error);
      const result = await fn({ body: parsed.data, req });
      return result instanceof Response ? result : Response.json(result ?? { ok: true });
    } catch (err) {
      return errorResponse(err);
    }
  };
}

export type ActionResult<T> = { ok: true; data: T } | { ok: false; code: string; message: string; fields?: FieldErrors };

/** The same wrapper for server actions: they are public endpoints too. */
export function action<S extends z.ZodType, T>(
  opts: { permission: Permission; input: S },
  fn: (args: { user: SessionUser; input: z.output<S> }) => Promise<T>,
) {
  return async (raw: z.input<S>): Promise<ActionResult<T>> => {
    try {
      const problem = foreignOriginProblem(await headers(), appOrigin());
      if (problem) throw new AppError("forbidden", problem);
      const user = await requireUser(opts.permission);
      assertStorable(raw);
      const parsed = opts.input.safeParse(raw);
      if (!parsed.success) throw invalid(parsed.error);
      return { ok: true, data: await fn({ user, input: parsed.data }) };
    } catch (err) {
      const { body } = toErrorBody(err);
      return { ok: false, code: body.error.code, message: body.error.message, fields: body.error.fields };
    }
  };
}
