import "server-only";
import { and, eq, ne } from "drizzle-orm";
import { db } from "@/db/client";
import { firms, projectMembers, users, type Project } from "@/db/schema";
import { appOrigin } from "@/lib/env";
import { composeMail, queueMail, type MailAttachment } from "@/lib/mail";
import { currencySymbol } from "@/lib/quote/currency";
import { formatLongDate } from "@/lib/quote/programme-chart";
import type { Quotation } from "@/lib/quote/quotation";
import { formatAmount } from "@/lib/quote/totals";
import { INVITATION_DAYS } from "@/lib/spec/committee";

/**
 * The e-mails the committee's work sends. Each is queued (lib/mail) after the change it reports was
 * saved, and never makes that change fail.
 */

async function firmName(): Promise<string> {
  const [firm] = await db.select({ name: firms.name }).from(firms).limit(1);
  return firm?.name ?? "Your organ builder";
}

const url = (path: string) => `${appOrigin()}${path}`;

/** Members of a project on one side: the committee (clients) or the firm; enabled accounts only. */
export async function projectRecipients({ projectId, side, except }: { projectId: string; side: "committee" | "firm"; except?: string }) {
  const rows = await db
    .select({ id: users.id, email: users.email, name: users.name })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(
      and(
        eq(projectMembers.projectId, projectId),
        eq(users.disabled, false),
        side === "committee" ? eq(users.role, "client") : ne(users.role, "client"),
        except ? ne(users.id, except) : undefined,
      ),
    );
  return rows;
}

export async function sendInvitation({ project, email, name, token, invitedBy }: { project: Project; email: string; name: string; token: string; invitedBy: string }) {
  const firm = await firmName();
  const link = url(`/invite/${token}`);
  const body = composeMail({
    greeting: `Dear ${name},`,
    paragraphs: [
      `${invitedBy} of ${firm} invites you to the organ committee's pages for ${project.name} in Stopwright.`,
      `There you can read the schemes the firm shares with the committee, compare them side by side, comment on them (on a single stop, too) and record which one you prefer.`,
      `Follow the link to choose a password. It works once, and for ${INVITATION_DAYS} days.`,
    ],
    links: [{ label: "Accept the invitation", url: link }],
    signature: firm,
    footer: `You receive this because ${invitedBy} entered ${email}. If you did not expect it, ignore it: nothing happens unless the link is followed.`,
  });
  return queueMail({ kind: "invitation", to: email, subject: `Invitation: ${project.name} — organ committee`, ...body });
}

export async function sendAddedToProject({ project, email, name, addedBy }: { project: Project; email: string; name: string; addedBy: string }) {
  const firm = await firmName();
  const body = composeMail({
    greeting: `Dear ${name},`,
    paragraphs: [`${addedBy} of ${firm} has added you to the organ committee of ${project.name}. Sign in with your usual password to see the schemes shared with the committee.`],
    links: [{ label: "Open the project", url: url(`/projects/${project.id}`) }],
    signature: firm,
  });
  return queueMail({ kind: "committee-added", to: email, subject: `${project.name}: you were added to the committee`, ...body });
}

export async function sendSchemeShared({ project, schemeId, schemeName, sharedBy }: { project: Project; schemeId: string; schemeName: string; sharedBy: string }) {
  const recipients = await projectRecipients({ projectId: project.id, side: "committee" });
  if (!recipients.length) return null;
  const firm = await firmName();
  const body = composeMail({
    paragraphs: [
      `${sharedBy} of ${firm} has shared a scheme with the organ committee of ${project.name}: "${schemeName}".`,
      `You can read its stop list, compare it with the other schemes, comment on it and record your preference.`,
    ],
    links: [
      { label: "Read the scheme", url: url(`/projects/${project.id}/schemes/${schemeId}`) },
      { label: "Compare the schemes", url: url(`/projects/${project.id}/compare`) },
    ],
    signature: firm,
    footer: `You receive this as a member of the organ committee of ${project.name}.`,
  });
  // One message per member, so no one learns the others' addresses.
  return Promise.all(recipients.map((r) => queueMail({ kind: "scheme-shared", to: r.email, subject: `${project.name}: new scheme "${schemeName}"`, ...body })));
}

export async function sendCommentNotice({ project, schemeId, schemeName, author, stopLabel, text }: { project: Project; schemeId: string; schemeName: string; author: { id: string; name: string; role: string }; stopLabel: string | null; text: string }) {
  const recipients = await projectRecipients({ projectId: project.id, side: "firm", except: author.id });
  if (!recipients.length) return null;
  const where = stopLabel ? `on the ${stopLabel} of "${schemeName}"` : `on "${schemeName}"`;
  const who = author.role === "client" ? `${author.name} (organ committee)` : author.name;
  const body = composeMail({
    paragraphs: [`${who} commented ${where} (${project.name}):`, text.length > 1200 ? `${text.slice(0, 1200)}…` : text],
    links: [{ label: "Read and answer", url: url(`/projects/${project.id}/schemes/${schemeId}#comments`) }],
    footer: `You receive this as a member of the project ${project.name} at the firm.`,
  });
  return queueMail({ kind: "comment", to: recipients.map((r) => r.email), subject: `${project.name}: comment by ${author.name}`, ...body });
}

/**
 * The tender of an issued quotation, as a Word document, to each committee member: one message each,
 * so no one learns the others' addresses. Returns how many messages were queued.
 */
export async function sendTender({ project, recipients, quotation, document, sentBy }: { project: Project; recipients: readonly { email: string }[]; quotation: Quotation; document: MailAttachment; sentBy: string }): Promise<number> {
  const firm = quotation.firm.name || (await firmName());
  const total = `${currencySymbol(quotation.commercial.currency)}${formatAmount(quotation.totals.totalAmount)}`;
  const body = composeMail({
    paragraphs: [
      `${sentBy} of ${firm} sends the organ committee of ${project.name} the tender ${quotation.number} for the scheme "${quotation.scheme.name}".`,
      `The tendered price is ${total}${quotation.validUntil ? `, valid until ${formatLongDate(quotation.validUntil)}` : ""}. The tender is attached as a Word document; its options are priced apart from the total.`,
      `You can also download it from the project's page, where the committee's schemes, comparison and comments are.`,
    ],
    links: [{ label: "Open the project", url: url(`/projects/${project.id}`) }],
    signature: firm,
    footer: `You receive this as a member of the organ committee of ${project.name}.`,
  });
  const queued = await Promise.all(
    recipients.map((r) => queueMail({ kind: "tender", to: r.email, subject: `${project.name}: tender ${quotation.number}`, ...body, attachments: [document] })),
  );
  return queued.filter(Boolean).length;
}
