import { AppError, errorResponse } from "@/lib/server/errors";

/** Any /api address no route answers: a JSON 404 in our words, not the HTML page for screens. */
function noSuchAddress(): Response {
  return errorResponse(new AppError("not_found", "There is no API address like this one; see \"The API\" in DEVELOPERS.md."));
}

export const GET = noSuchAddress;
export const POST = noSuchAddress;
export const PUT = noSuchAddress;
export const PATCH = noSuchAddress;
export const DELETE = noSuchAddress;
