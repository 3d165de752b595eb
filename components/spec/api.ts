/** The browser's calls to Stopwright's JSON API; errors keep their code, field messages and details. */
import type { SchemeDocument, SchemeRead, SchemeStatus } from "@/lib/spec/document";
import type { ProjectInput, ProjectRead, ProjectSummary, SchemeSummary } from "@/lib/spec/projects";

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
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
    throw new ApiError(res.status, err?.code ?? "http_" + res.status, err?.message ?? `The server answered ${res.status}.`, err?.fields, err?.details);
  }
  return json as T;
}

/** Field messages of a 422 as one list, each once. */
export function fieldMessages(err: ApiError): string[] {
  const all = Object.values(err.fields ?? {}).flat();
  return [...new Set(all.length ? all : [err.message])];
}

export type Revision = { version: number; note: string | null; authorName: string | null; createdAt: string };

export const api = {
  listProjects: (archived: boolean) => call<{ projects: ProjectSummary[] }>("GET", `/api/projects${archived ? "?archived=1" : ""}`),
  createProject: (input: ProjectInput) => call<{ project: ProjectRead }>("POST", "/api/projects", input),
  getProject: (id: string) => call<{ project: ProjectRead; schemes: SchemeSummary[] }>("GET", `/api/projects/${id}`),
  updateProject: (id: string, input: Partial<ProjectInput>) => call<{ project: ProjectRead }>("PATCH", `/api/projects/${id}`, input),
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
};
