import { z } from "zod";
import "./messages";

/**
 * An e-mail address: at most 254 characters (RFC 5321's limit on a forward path, less its angle
 * brackets), measured before zod's e-mail pattern runs, so no length of input reaches a pattern.
 */
export const emailField = z
  .string()
  .max(254, { abort: true, error: "An e-mail address has at most 254 characters." })
  .trim()
  .toLowerCase()
  .pipe(z.email("Enter a valid e-mail address."));
