import { AppError } from "./errors";

/** A revision number from the URL; anything else is a page that does not exist. */
export function parseVersion(raw: string): number {
  const version = Number(raw);
  if (!Number.isInteger(version) || version < 1) throw new AppError("not_found", `"${raw}" is not a version number.`);
  return version;
}
