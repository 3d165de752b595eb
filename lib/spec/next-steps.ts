/**
 * "What happens next", for a committee member on their project's page: from the project's status
 * and the tenders sent to them, in plain words. Pure: the page gives it the facts it may show (no
 * prices, no drafts; only tenders that were sent to the committee).
 */
import type { QuoteStatus } from "@/lib/quote/quotation";
import type { ProjectStatus } from "./projects";

export type SentTender = {
  number: string;
  schemeName: string;
  status: QuoteStatus;
  /** ISO date (YYYY-MM-DD) or null. */
  validUntil: string | null;
  /** ISO timestamp of the last time it was sent to the committee. */
  sentAt: string | null;
};

export type NextStepsInput = {
  status: ProjectStatus;
  firmName: string;
  /** Names of the schemes shared with the committee. */
  sharedSchemes: readonly string[];
  tenders: readonly SentTender[];
  /** Whether this member has said which scheme they prefer. */
  hasPreference: boolean;
  /** Dates as the page shows them (e.g. "30 Sept 2028"). */
  formatDate: (iso: string) => string;
};

export type NextSteps = {
  /** Where things stand, in one sentence. */
  now: string;
  /** What the member can do, in order. */
  steps: string[];
  /** The tender the words are about, if any. */
  tender: SentTender | null;
};

/** The tender that matters now: the latest sent, preferring one still open (issued) over an answered or lapsed one. */
export function currentTender(tenders: readonly SentTender[]): SentTender | null {
  const sent = [...tenders.filter((t) => t.sentAt)].sort((a, b) => (b.sentAt ?? "").localeCompare(a.sentAt ?? ""));
  return sent.find((t) => t.status === "issued") ?? sent[0] ?? null;
}

export function committeeNextSteps(input: NextStepsInput): NextSteps {
  const firm = input.firmName.trim() || "The firm";
  const shared = input.sharedSchemes.length;
  const compare = shared > 1 ? "Compare the schemes shared with you" : "Read the scheme shared with you";
  const tender = currentTender(input.tenders);
  const contact = "Questions go in a comment on a scheme, or in a reply to the firm's e-mail.";

  if (input.status === "contracted" || input.status === "workshop" || input.status === "site" || input.status === "complete") {
    const now = {
      contracted: `The contract is agreed. ${firm} is planning the work.`,
      workshop: `${firm} is making and restoring the organ's parts in its workshop.`,
      site: `${firm} is installing and voicing the organ in the building.`,
      complete: "The work is complete.",
    }[input.status];
    const steps = input.status === "site"
      ? ["Keep clear of scaffolding, open cases and the blower room while the firm works on site; follow the site rules the firm gives you.", contact]
      : [contact];
    return { now, steps, tender };
  }

  if (tender) {
    const what = `tender ${tender.number} for ${tender.schemeName}`;
    if (tender.status === "issued") {
      const until = tender.validUntil ? `, valid until ${input.formatDate(tender.validUntil)}` : "";
      return {
        now: `${firm} has sent you ${what}${until}.`,
        steps: [
          "Download the tender below and discuss it with your committee.",
          "To accept it or to ask for changes, reply to the e-mail it came with; the firm records your committee's answer.",
          contact,
        ],
        tender,
      };
    }
    if (tender.status === "lapsed") {
      return {
        now: `The ${what} lapsed${tender.validUntil ? ` on ${input.formatDate(tender.validUntil)}` : ""}.`,
        steps: ["If your committee still wishes to go ahead, ask the firm for a fresh tender.", contact],
        tender,
      };
    }
    if (tender.status === "accepted") {
      return { now: `Your committee accepted ${what}. ${firm} is preparing the contract.`, steps: [contact], tender };
    }
    if (tender.status === "declined") {
      return { now: `Your committee declined ${what}.`, steps: [shared ? `${compare}; the firm can price another scheme.` : "The firm can prepare another scheme.", contact], tender };
    }
  }

  if (input.status === "tender" && shared) {
    return {
      now: `${firm} is preparing a tender: a priced offer for the scheme your committee prefers. It will come to you by e-mail.`,
      steps: [input.hasPreference ? "You have said which scheme you prefer; you can change your mind below until the tender is sent." : "Say below which scheme you prefer, so the tender prices the right one.", contact],
      tender: null,
    };
  }

  if (!shared) {
    return {
      now: `${firm} is preparing schemes for your organ.`,
      steps: ["You will get an e-mail when a scheme is shared with you; it will then appear on this page.", contact],
      tender: null,
    };
  }

  return {
    now: `${firm} is preparing schemes for your organ. ${shared === 1 ? "One scheme is" : `${shared} schemes are`} ready for you to read.`,
    steps: [
      `${compare}: open one to see its stops and what becomes of the existing pipes, or compare them side by side.`,
      input.hasPreference ? "You have said which scheme you prefer; you can change it below at any time." : "Say below which scheme you prefer, with a note if you like.",
      contact,
    ],
    tender: null,
  };
}
