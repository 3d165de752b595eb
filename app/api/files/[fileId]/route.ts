import { deleteFile, getFileForUser, updateFile } from "@/db/queries/files";
import { fileUpdateSchema } from "@/lib/files/kinds";
import { route } from "@/lib/server/guard";
import { fileParams } from "@/lib/server/params";

export const GET = route({ permission: "files:read", params: fileParams }, async ({ user, params }) => ({
  file: await getFileForUser({ user, fileId: params.fileId }),
}));

/** Caption, category, link to a division or stop; sharing with the committee needs files:share too. */
export const PATCH = route({ permission: "files:write", params: fileParams, body: fileUpdateSchema }, async ({ user, params, body }) => ({
  file: await updateFile({ user, fileId: params.fileId, patch: body }),
}));

export const DELETE = route({ permission: "files:write", params: fileParams }, async ({ user, params }) => {
  await deleteFile({ user, fileId: params.fileId });
  return { ok: true };
});
