/** The client committee's shapes, shared by forms, the API and the pages. Pure. */
import { z } from "zod";
import { personName } from "@/lib/validation/names";
import { newUserSchema } from "@/lib/validation/users";

/** How long an invitation link stays good. */
export const INVITATION_DAYS = 14;

export const inviteSchema = z.object({
  email: z.string().trim().toLowerCase().email("Enter a valid e-mail address."),
  name: personName,
});
export type InviteInput = z.input<typeof inviteSchema>;

export const acceptInvitationSchema = z
  .object({
    token: z.string().min(20, "This invitation link is not complete; open it again from the e-mail.").max(200),
    name: newUserSchema.shape.name,
    password: newUserSchema.shape.password,
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, { message: "The two passwords are not the same.", path: ["confirm"] });
export type AcceptInvitationInput = z.input<typeof acceptInvitationSchema>;

export const commentSchema = z.object({
  body: z.string().trim().min(1, "Write something first.").max(4000, "Keep a comment under 4,000 characters."),
  /** A stop of the scheme the comment is about; none for the scheme as a whole. */
  stopId: z.string().min(1).max(80).nullable().default(null),
});
export type CommentInput = z.input<typeof commentSchema>;

export const preferenceSchema = z.object({
  schemeId: z.uuid("Choose one of the schemes."),
  note: z.string().trim().max(1000, "Keep the note under 1,000 characters.").default(""),
});
export type PreferenceInput = z.input<typeof preferenceSchema>;

export type InvitationState = "pending" | "expired" | "accepted" | "withdrawn";

export type InvitationSummary = {
  id: string;
  email: string;
  name: string;
  state: InvitationState;
  invitedByName: string | null;
  sentAt: string;
  expiresAt: string;
  acceptedAt: string | null;
};

export type CommentRead = {
  id: string;
  schemeId: string;
  stopId: string | null;
  stopLabel: string | null;
  body: string;
  authorId: string;
  authorName: string;
  /** "committee" for a client member, "firm" for the organ builder's people. */
  authorSide: "committee" | "firm";
  createdAt: string;
};

export type PreferenceRead = { schemeId: string; schemeName: string; note: string; updatedAt: string };

export type PreferenceSummary = {
  /** Every committee member of the project, with their preference or null. */
  members: { userId: string; name: string; preference: PreferenceRead | null }[];
  /** Shared schemes with how many members prefer each. */
  schemes: { schemeId: string; schemeName: string; count: number }[];
};

export function invitationState(inv: { acceptedAt: Date | string | null; withdrawnAt: Date | string | null; expiresAt: Date | string }, now = new Date()): InvitationState {
  if (inv.acceptedAt) return "accepted";
  if (inv.withdrawnAt) return "withdrawn";
  return new Date(inv.expiresAt).getTime() <= now.getTime() ? "expired" : "pending";
}
