import { deleteFile, getFileForUser, updateFile } from "@/db/queries/files";
import { fileUpdateSchema } from "@/lib/files/kinds";
import { route } from "@/lib/server/guard";

type Params = { fileId: string };

export const GET = route<undefined, Params>({ permission: "files:read" }, async ({ user, params }) => ({
  file: await getFileForUser({ user, fileId: params.fileId }),
}));

/** Caption, category, link to a division or stop; sharing with the committee needs files:share too. */
export const PATCH = route<typeof fileUpdateSchema, Params>({ permission: "files:write", body: fileUpdateSchema }, async ({ user, params, body }) => ({
  file: await updateFile({ user, fileId: params.fileId, patch: body }),
}));

export const DELETE = route<undefined, Params>({ permission: "files:write" }, async ({ user, params }) => {
  await deleteFile({ user, fileId: params.fileId });
  return { ok: true };
});
