"use client";
/** The browser's side of survey files: query keys, reads, and the upload (presigned PUT with progress). */
import { ApiError, call } from "@/components/spec/api";
import type { FileUpdate, StartUpload, SurveyFile, UploadTicket } from "@/lib/files/kinds";
import { keys } from "@/lib/query/keys";

/** The files' keys from the app's one query-key factory (lib/query/keys.ts). */
export const fileQueryKeys = keys.files;

export function listFiles(projectId: string, filter: { schemeId?: string; stopId?: string } = {}) {
  const q = new URLSearchParams(Object.entries(filter).filter(([, v]) => v) as [string, string][]).toString();
  return call<{ files: SurveyFile[] }>("GET", `/api/projects/${projectId}/files${q ? `?${q}` : ""}`).then((r) => r.files);
}

export const updateFile = (fileId: string, patch: FileUpdate) => call<{ file: SurveyFile }>("PATCH", `/api/files/${fileId}`, patch).then((r) => r.file);
export const deleteFile = (fileId: string) => call<{ ok: true }>("DELETE", `/api/files/${fileId}`);

export type UploadPhase = { phase: "sending"; fraction: number } | { phase: "checking" };

/** PUTs the bytes straight to object storage, reporting progress; the app never relays them. */
function put(url: string, file: File, onProgress: (fraction: number) => void): Promise<void> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("PUT", url);
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(e.loaded / e.total);
    xhr.onload = () => (xhr.status >= 200 && xhr.status < 300 ? resolve() : reject(new ApiError(xhr.status, "storage", "The file store refused the upload; try again in a minute.")));
    xhr.onerror = () => reject(new ApiError(0, "network", "The upload was interrupted; check the connection and try again."));
    xhr.send(file);
  });
}

/** Start (the server checks the name and size), send, then complete (the server checks the bytes). */
export async function uploadFile(projectId: string, file: File, meta: Omit<StartUpload, "name" | "size">, onPhase: (p: UploadPhase) => void): Promise<SurveyFile> {
  const { upload } = await call<{ upload: UploadTicket }>("POST", `/api/projects/${projectId}/files`, { ...meta, name: file.name, size: file.size });
  onPhase({ phase: "sending", fraction: 0 });
  await put(upload.uploadUrl, file, (fraction) => onPhase({ phase: "sending", fraction }));
  onPhase({ phase: "checking" });
  return (await call<{ file: SurveyFile }>("POST", `/api/files/${upload.fileId}/complete`)).file;
}
