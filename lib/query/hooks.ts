"use client";
/**
 * Every read and write the browser makes, on TanStack Query: reads under the keys of keys.ts (the
 * server prefetches the same keys for the first paint), writes as mutations that say which reads
 * they make stale. Errors are ApiError, whose code is the server's typed code.
 */
import { useMutation, useQuery, useQueryClient, type QueryKey } from "@tanstack/react-query";
import { api, type UserRow } from "@/components/spec/api";
import type { CommentInput } from "@/lib/spec/committee";
import type { SchemeStatus } from "@/lib/spec/document";
import type { ProjectInput, ProjectStatus } from "@/lib/spec/projects";
import { keys } from "./keys";

/** A mutation that refetches what it makes stale once it succeeds. */
export function useWrite<A, R>(fn: (args: A) => Promise<R>, stale: (args: A, result: R) => readonly QueryKey[]) {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: (result, args) => Promise.all(stale(args, result).map((queryKey) => qc.invalidateQueries({ queryKey }))),
  });
}

// ── projects and their schemes ──
export const useProjects = (archived: boolean) => useQuery({ queryKey: keys.projects.list(archived), queryFn: async () => (await api.listProjects(archived)).projects });
export const useProject = (projectId: string) => useQuery({ queryKey: keys.projects.detail(projectId), queryFn: () => api.getProject(projectId) });

export const useCreateProject = () => useWrite((input: ProjectInput) => api.createProject(input), () => [keys.projects.all]);
export const useUpdateProject = (projectId: string) => useWrite((input: Partial<ProjectInput>) => api.updateProject(projectId, input), () => [keys.projects.all]);
export const useSetProjectStatus = (projectId: string) => useWrite((status: ProjectStatus) => api.setProjectStatus(projectId, status), () => [keys.projects.all]);
export const useArchiveProject = (projectId: string) => useWrite((archived: boolean) => api.archiveProject(projectId, archived), () => [keys.projects.all]);
export const useAddMember = (projectId: string) => useWrite((email: string) => api.addMember(projectId, email), () => [keys.projects.detail(projectId)]);
export const useRemoveMember = (projectId: string) => useWrite((userId: string) => api.removeMember(projectId, userId), () => [keys.projects.detail(projectId)]);
export const useCreateScheme = (projectId: string) =>
  useWrite((input: { name: string; description?: string }) => api.createScheme(projectId, input), () => [keys.projects.all]);
export const useDuplicateScheme = () =>
  useWrite((args: { schemeId: string; name: string }) => api.duplicateScheme(args.schemeId, args.name), () => [keys.projects.all]);
export const usePatchScheme = (projectId: string) =>
  useWrite(
    (args: { schemeId: string; status?: SchemeStatus; sharedWithClient?: boolean }) => api.patchScheme(args.schemeId, { status: args.status, sharedWithClient: args.sharedWithClient }),
    (args) => [keys.projects.detail(projectId), keys.projects.list(false), keys.schemes.detail(args.schemeId)],
  );

// ── the committee ──
export const useInvitations = (projectId: string, enabled = true) =>
  useQuery({ queryKey: keys.projects.invitations(projectId), queryFn: async () => (await api.listInvitations(projectId)).invitations, enabled });
const committeeKeys = (projectId: string) => [keys.projects.invitations(projectId), keys.projects.detail(projectId), keys.projects.preferences(projectId)];
export const useInvite = (projectId: string) => useWrite((input: { email: string; name: string }) => api.invite(projectId, input), () => committeeKeys(projectId));
export const useResendInvitation = (projectId: string) => useWrite((id: string) => api.resendInvitation(id), () => committeeKeys(projectId));
export const useWithdrawInvitation = (projectId: string) => useWrite((id: string) => api.withdrawInvitation(id), () => committeeKeys(projectId));
export const useRemoveCommitteeMember = (projectId: string) => useWrite((userId: string) => api.removeCommitteeMember(projectId, userId), () => committeeKeys(projectId));

export const useComments = (schemeId: string) => useQuery({ queryKey: keys.schemes.comments(schemeId), queryFn: async () => (await api.listComments(schemeId)).comments });
export const useAddComment = (schemeId: string) => useWrite((input: CommentInput) => api.addComment(schemeId, input), () => [keys.schemes.comments(schemeId)]);
export const useDeleteComment = (schemeId: string) => useWrite((id: string) => api.deleteComment(id), () => [keys.schemes.comments(schemeId)]);
export const useNotes = (schemeId: string, enabled = true) => useQuery({ queryKey: keys.schemes.notes(schemeId), queryFn: async () => (await api.listNotes(schemeId)).notes, enabled });
export const useAddNote = (schemeId: string) => useWrite((input: CommentInput) => api.addNote(schemeId, input), () => [keys.schemes.notes(schemeId)]);
export const useDeleteNote = (schemeId: string) => useWrite((id: string) => api.deleteNote(id), () => [keys.schemes.notes(schemeId)]);

export const useOwnPreference = (projectId: string, enabled = true) =>
  useQuery({ queryKey: keys.projects.ownPreference(projectId), queryFn: async () => (await api.getOwnPreference(projectId)).preference, enabled });
export const useRecordPreference = (projectId: string) =>
  useWrite((input: { schemeId: string; note?: string }) => api.recordPreference(projectId, input), () => [keys.projects.ownPreference(projectId)]);
export const useClearPreference = (projectId: string) => useWrite(() => api.clearPreference(projectId), () => [keys.projects.ownPreference(projectId)]);
export const usePreferenceSummary = (projectId: string, enabled = true) =>
  useQuery({ queryKey: keys.projects.preferences(projectId), queryFn: async () => (await api.getPreferenceSummary(projectId)).summary, enabled });

// ── comparison ──
export const useComparison = (projectId: string, schemeIds: readonly string[]) =>
  useQuery({ queryKey: keys.projects.comparison(projectId, schemeIds), queryFn: async () => (await api.compare(projectId, schemeIds)).comparison, enabled: schemeIds.length >= 2 });
export const useChangeCosts = (projectId: string, schemeIds: readonly string[], enabled: boolean) =>
  useQuery({ queryKey: keys.projects.changeCosts(projectId, schemeIds), queryFn: async () => (await api.changeCosts(projectId, schemeIds)).costs, enabled: enabled && schemeIds.length >= 2 });

// ── users (administrators) ──
export const useUsers = () => useQuery({ queryKey: keys.users.list, queryFn: async () => (await api.listUsers()).users.map(userRow) });
const userRow = (u: UserRow): UserRow => ({ id: u.id, name: u.name, email: u.email, role: u.role, disabled: u.disabled });

// ── outgoing mail ──
export const useOutbox = () => useQuery({ queryKey: keys.mail.outbox, queryFn: async () => (await api.listOutgoingMail()).messages, refetchInterval: 5_000 });
export const useResendMail = () => useWrite((id: string) => api.resendMail(id), () => [keys.mail.outbox]);
