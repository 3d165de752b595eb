import { listFilesForUser, startUpload } from "@/db/queries/files";
import { startUploadSchema } from "@/lib/files/kinds";
import { route } from "@/lib/server/guard";
import { projectParams } from "@/lib/server/params";

/** The project's survey files; `?schemeId=&stopId=` (or `&divisionId=`) narrows to one stop's or division's. */
export const GET = route({ permission: "files:read", params: projectParams }, async ({ user, params, url }) => ({
  files: await listFilesForUser({
    user,
    projectId: params.projectId,
    schemeId: url.searchParams.get("schemeId") ?? undefined,
    stopId: url.searchParams.get("stopId") ?? undefined,
    divisionId: url.searchParams.get("divisionId") ?? undefined,
  }),
}));

/**
 * Starts an upload: the answer holds a link the browser PUTs the bytes to, straight to object
 * storage; then POST /api/files/:id/complete has the server check them and record the file.
 */
export const POST = route({ permission: "files:write", params: projectParams, body: startUploadSchema }, async ({ user, params, body }) =>
  Response.json({ upload: await startUpload({ user, projectId: params.projectId, input: body }) }, { status: 201 }),
);
