/** Who may see which part of a quotation: the one rule the routes, pages and tests share. Pure. */
import { can, type Role } from "@/lib/roles";

export const documentKinds = ["tender", "cost-sheet", "work-list"] as const;
export type DocumentKind = (typeof documentKinds)[number];

export const documentLabels: Readonly<Record<DocumentKind, string>> = {
  tender: "Tender",
  "cost-sheet": "Internal cost sheet",
  "work-list": "Workshop work list",
};

/** The quotation itself, with its prices: the firm's people who may see money. */
export function mayReadQuotation(role: Role): boolean {
  return can(role, "money:read");
}

/** The quotation's total: the money roles always; a committee member once the tender was sent to them. */
export function maySeeTotal(role: Role, sentToClient: boolean): boolean {
  return can(role, "money:read") || (role === "client" && sentToClient);
}

/**
 * The tender goes to the firm's money roles, and to a committee member once it was sent to them;
 * the internal cost sheet never leaves the money roles; the work list (no prices) is for the workshop
 * and everyone who reads estimates.
 */
export function mayDownload(role: Role, kind: DocumentKind, sentToClient: boolean): boolean {
  if (kind === "tender") return can(role, "money:read") || (role === "client" && sentToClient);
  if (kind === "cost-sheet") return can(role, "money:read");
  return can(role, "estimate:read");
}

/** Which quotations a role finds in a project's list. */
export function listsQuotation(role: Role, sentToClient: boolean, status: string): boolean {
  if (role === "client") return sentToClient;
  if (can(role, "money:read")) return true;
  // The workshop sees the quotations that were issued, for their work lists.
  return can(role, "estimate:read") && status !== "draft";
}
