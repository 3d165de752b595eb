import { z } from "zod";
import { DATABASE_UNAVAILABLE_MESSAGE, databaseProblem, rootCauseMessage } from "./db-errors";

/** Typed error codes and their HTTP statuses: the one way an error becomes a response. */
export const errorStatus = {
  bad_request: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unsupported_media_type: 415,
  invalid: 422,
  too_many_requests: 429,
  internal: 500,
  unavailable: 503,
} as const;
export type ErrorCode = keyof typeof errorStatus;

export type FieldErrors = Record<string, string[]>;

export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields?: FieldErrors,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = "AppError";
  }
}

/** Every zod issue with its full path ("divisions.0.stops.3.footage"), not only the first one. */
export function fieldErrorsFromZod(error: z.ZodError): FieldErrors {
  const out: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_";
    (out[key] ??= []).push(issue.message);
  }
  return out;
}

export function invalid(error: z.ZodError, message = "Some fields are not valid."): AppError {
  return new AppError("invalid", message, fieldErrorsFromZod(error));
}

export type ErrorBody = { error: { code: ErrorCode; message: string; fields?: FieldErrors; details?: unknown } };

/** Seconds a client should wait before trying again after a 503 (the pool's connection timeout is 3 s). */
export const RETRY_AFTER_SECONDS = 5;

/** The AppError a thrown value stands for; database trouble in the product's words, anything else null. */
export function asAppError(err: unknown): AppError | null {
  if (err instanceof AppError) return err;
  switch (databaseProblem(err)) {
    case "unavailable":
      return new AppError("unavailable", DATABASE_UNAVAILABLE_MESSAGE);
    case "conflict":
      return new AppError("conflict", "Someone else changed this at the same moment; reload and try again.");
    case "bad_value":
      return new AppError("bad_request", "A value in the request cannot be stored (a date, number or text out of range); nothing was saved.");
    default:
      return null;
  }
}

export function toErrorBody(err: unknown): { status: number; body: ErrorBody } {
  const known = asAppError(err);
  if (known) {
    // The driver's own words stay in the server log; the client gets ours.
    if (!(err instanceof AppError)) console.error(`database: ${known.code}: ${rootCauseMessage(err)}`);
    return {
      status: errorStatus[known.code],
      body: { error: { code: known.code, message: known.message, fields: known.fields, details: known.details } },
    };
  }
  // Never send a stack trace to a client; log it on the server.
  console.error(err);
  return { status: 500, body: { error: { code: "internal", message: "Something went wrong on the server." } } };
}

export function errorResponse(err: unknown): Response {
  const { status, body } = toErrorBody(err);
  const headers: Record<string, string> = { "cache-control": "no-store" };
  if (status === 503) headers["retry-after"] = String(RETRY_AFTER_SECONDS);
  return Response.json(body, { status, headers });
}
