import { z } from "zod";

/** Typed error codes and their HTTP statuses: the one way an error becomes a response. */
export const errorStatus = {
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  invalid: 422,
  unsupported_media_type: 415,
  bad_request: 400,
  unavailable: 503,
  internal: 500,
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

export function toErrorBody(err: unknown): { status: number; body: ErrorBody } {
  if (err instanceof AppError) {
    return {
      status: errorStatus[err.code],
      body: { error: { code: err.code, message: err.message, fields: err.fields, details: err.details } },
    };
  }
  // Never send a stack trace to a client; log it on the server.
  console.error(err);
  return { status: 500, body: { error: { code: "internal", message: "Something went wrong on the server." } } };
}

export function errorResponse(err: unknown): Response {
  const { status, body } = toErrorBody(err);
  return Response.json(body, { status });
}
