/** The browser's calls to Stopwright's JSON API; errors keep their code, field messages and details. */
import type { ErrorCode } from "@/lib/server/errors";
import type { ChangeCost, ComparisonView } from "@/lib/spec/comparison";
import type { CommentInput, CommentRead, InvitationSummary, InviteInput, PreferenceRead, PreferenceSummary, AcceptInvitationInput } from "@/lib/spec/committee";
import type { SchemeDocument, SchemeRead, SchemeStatus } from "@/lib/spec/document";
import type { ProjectInput, ProjectRead, ProjectSummary, SchemeSummary } from "@/lib/spec/projects";
import type { OutboxMessage } from "@/lib/mail/types";
import type { Role } from "@/lib/roles";

/**
 * The client's one error type: the server's typed code (lib/server/errors.ts); "network" when no
 * answer came; "storage" when the file store refused a direct upload (components/files).
 */
export type ClientErrorCode = ErrorCode | "network" | "storage";

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: ClientErrorCode,
    message: string,
    readonly fields?: Record<string, string[]>,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = "ApiError";
  }
}

export async function call<T>(method: string, url: string, body?: unknown): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, {
      method,
      headers: body === undefined ? undefined : { "content-type": "application/json" },
      body: body === undefined ? undefined : JSON.stringify(body),
      cache: "no-store",
    });
  } catch {
    throw new ApiError(0, "network", "The server could not be reached. Your work is kept here; try again.");
  }
  const text = await res.text();
  let json: unknown = null;
  try {
    json = text ? JSON.parse(text) : null;
  } catch {
    json = null;
  }
  if (!res.ok) {
    const err = (json as { error?: { code?: string; message?: string; fields?: Record<string, string[]>; details?: unknown } } | null)?.error;
    throw new ApiError(res.status, codeOf(res.status, err?.code), err?.message ?? `The server answered ${res.status}.`, err?.fields, err?.details);
  }
  return json as T;
}

const codes: Record<number, ErrorCode> = { 400: "bad_request", 401: "unauthenticated", 403: "forbidden", 404: "not_found", 409: "conflict", 415: "unsupported_media_type", 422: "invalid", 503: "unavailable" };
/** The server's code as sent; an answer without one (a proxy's page) is named by its status. */
function codeOf(status: number, code: string | undefined): ErrorCode {
  return code && code in codesByName ? (code as ErrorCode) : (codes[status] ?? "internal");
}
const codesByName = Object.fromEntries(Object.values(codes).map((c) => [c, true]).concat([["internal", true]]));

/** A server action's result as the same error type, so forms treat actions and routes alike. */
export function unwrapAction<T>(res: { ok: true; data: T } | { ok: false; code: string; message: string; fields?: Record<string, string[]> }): T {
  if (res.ok) return res.data;
  throw new ApiError(0, codeOf(0, res.code), res.message, res.fields);
}

/** The message to show for any error a mutation or query gave. */
export function errorText(err: unknown, fallback = "That did not work."): string {
  return err instanceof ApiError ? err.message : fallback;
}

/** Field messages of a 422 as one list, each once. */
export function fieldMessages(err: ApiError): string[] {
  const all = Object.values(err.fields ?? {}).flat();
  return [...new Set(all.length ? all : [err.message])];
}

export type UserRow = { id: string; name: string; email: string; role: Role; disabled: boolean };

export type Revision = { version: number; note: string | null; authorName: string | null; createdAt: string };

export const api = {
  listProjects: (archived: boolean) => call<{ projects: ProjectSummary[] }>("GET", `/api/projects${archived ? "?archived=1" : ""}`),
  createProject: (input: ProjectInput) => call<{ project: ProjectRead }>("POST", "/api/projects", input),
  getProject: (id: string) => call<{ project: ProjectRead; schemes: SchemeSummary[] }>("GET", `/api/projects/${id}`),
  updateProject: (id: string, input: Partial<ProjectInput>) => call<{ project: ProjectRead }>("PATCH", `/api/projects/${id}`, input),
  setProjectStatus: (id: string, status: ProjectInput["status"]) => call<{ project: ProjectRead }>("PUT", `/api/projects/${id}/status`, { status }),
  archiveProject: (id: string, archived: boolean) => call<{ project: ProjectRead }>("POST", `/api/projects/${id}/archive`, { archived }),
  addMember: (id: string, email: string) => call<{ project: ProjectRead }>("POST", `/api/projects/${id}/members`, { email }),
  removeMember: (id: string, userId: string) => call<{ project: ProjectRead }>("DELETE", `/api/projects/${id}/members/${userId}`),
  createScheme: (projectId: string, input: { name: string; description?: string }) =>
    call<{ scheme: SchemeRead }>("POST", `/api/projects/${projectId}/schemes`, input),
  duplicateScheme: (schemeId: string, name: string) => call<{ scheme: SchemeRead }>("POST", `/api/schemes/${schemeId}/duplicate`, { name }),
  getScheme: (id: string) => call<{ scheme: SchemeRead }>("GET", `/api/schemes/${id}`),
  saveScheme: (id: string, body: { version: number; document: SchemeDocument; note?: string }) =>
    call<{ scheme: SchemeRead }>("PUT", `/api/schemes/${id}`, body),
  patchScheme: (id: string, body: { status?: SchemeStatus; sharedWithClient?: boolean }) => call<{ scheme: SchemeRead }>("PATCH", `/api/schemes/${id}`, body),
  listRevisions: (id: string) => call<{ revisions: Revision[] }>("GET", `/api/schemes/${id}/revisions`),
  getRevision: (id: string, version: number) =>
    call<{ revision: Revision & { document: SchemeDocument } }>("GET", `/api/schemes/${id}/revisions/${version}`),
  restoreRevision: (id: string, version: number, currentVersion: number) =>
    call<{ scheme: SchemeRead }>("POST", `/api/schemes/${id}/revisions/${version}/restore`, { version: currentVersion }),

  // The committee
  listInvitations: (projectId: string) => call<{ invitations: InvitationSummary[] }>("GET", `/api/projects/${projectId}/invitations`),
  invite: (projectId: string, input: InviteInput) =>
    call<{ kind: "invited"; invitation: InvitationSummary } | { kind: "added"; member: { id: string; name: string; email: string } }>("POST", `/api/projects/${projectId}/invitations`, input),
  resendInvitation: (id: string) => call<{ invitation: InvitationSummary }>("POST", `/api/invitations/${id}/resend`),
  withdrawInvitation: (id: string) => call<{ invitation: InvitationSummary }>("DELETE", `/api/invitations/${id}`),
  acceptInvitation: (input: AcceptInvitationInput) => call<{ email: string; projectId: string }>("POST", "/api/invitations/accept", input),
  removeCommitteeMember: (projectId: string, userId: string) => call<{ ok: true }>("DELETE", `/api/projects/${projectId}/committee/${userId}`),
  listComments: (schemeId: string) => call<{ comments: CommentRead[] }>("GET", `/api/schemes/${schemeId}/comments`),
  addComment: (schemeId: string, input: CommentInput) => call<{ comment: CommentRead }>("POST", `/api/schemes/${schemeId}/comments`, input),
  deleteComment: (id: string) => call<{ schemeId: string }>("DELETE", `/api/comments/${id}`),
  listNotes: (schemeId: string) => call<{ notes: CommentRead[] }>("GET", `/api/schemes/${schemeId}/notes`),
  addNote: (schemeId: string, input: CommentInput) => call<{ note: CommentRead }>("POST", `/api/schemes/${schemeId}/notes`, input),
  deleteNote: (id: string) => call<{ schemeId: string }>("DELETE", `/api/notes/${id}`),
  getOwnPreference: (projectId: string) => call<{ preference: PreferenceRead | null }>("GET", `/api/projects/${projectId}/preference`),
  recordPreference: (projectId: string, input: { schemeId: string; note?: string }) => call<{ preference: PreferenceRead }>("PUT", `/api/projects/${projectId}/preference`, input),
  clearPreference: (projectId: string) => call<{ preference: null }>("DELETE", `/api/projects/${projectId}/preference`),
  getPreferenceSummary: (projectId: string) => call<{ summary: PreferenceSummary }>("GET", `/api/projects/${projectId}/preferences`),
  compare: (projectId: string, schemeIds: readonly string[]) =>
    call<{ comparison: ComparisonView }>("GET", `/api/projects/${projectId}/compare?schemes=${schemeIds.map(encodeURIComponent).join(",")}`),
  changeCosts: (projectId: string, schemeIds: readonly string[]) =>
    call<{ costs: { schemeId: string; changes: ChangeCost[] }[] }>("GET", `/api/projects/${projectId}/compare/costs?schemes=${schemeIds.map(encodeURIComponent).join(",")}`),

  // Users (administrators)
  listUsers: () => call<{ users: UserRow[] }>("GET", "/api/users"),

  // Outgoing mail (administrators)
  listOutgoingMail: () => call<{ messages: OutboxMessage[] }>("GET", "/api/admin/mail"),
  resendMail: (id: string) => call<{ ok: true }>("POST", `/api/admin/mail/${id}/resend`),
};
