/**
 * Names people type (a user, a committee member, a project): what is shown is what was meant.
 * Unicode's explicit direction controls (embeddings, overrides and isolates, U+202A–U+202E and
 * U+2066–U+2069, and the marks U+200E, U+200F, U+061C; Unicode Standard Annex #9, "Explicit
 * Directional Formatting Characters") let a name show reversed or hide part of itself, e.g.
 * "Ada\u202Eelbats" shows as "Adastable". They are taken out before the name is checked; right-to-left
 * letters themselves (Arabic, Hebrew…) are kept and show correctly without them. Pure.
 */
import { z } from "zod";

const DIRECTION_CONTROLS = /[\u200E\u200F\u061C\u202A-\u202E\u2066-\u2069]/g;

export function withoutDirectionControls(text: string): string {
  return text.replace(DIRECTION_CONTROLS, "");
}

/** A person's name: direction controls taken out, trimmed, 1–120 characters. */
export const personName = z
  .string()
  // Bounded before anything scans it (the limit leaves room for the controls taken out).
  .max(480, { abort: true, error: "Keep the name under 120 characters." })
  .transform(withoutDirectionControls)
  .pipe(z.string().trim().min(1, "Enter the person's name.").max(120, "Keep the name under 120 characters."));

/** A name of something (a project, a client, a scheme): direction controls taken out, then the given checks. */
export function cleanName(check: z.ZodString, bound = 2000) {
  return z.string().max(bound, { abort: true, error: "This name is far too long." }).transform(withoutDirectionControls).pipe(check);
}
