import { addNote, listNotes } from "@/db/queries/comments";
import { route } from "@/lib/server/guard";
import { uuidParams } from "@/lib/server/params";
import { commentSchema } from "@/lib/spec/committee";

/** The firm's own notes: no client holds notes:read or notes:write. */
export const GET = route({ permission: "notes:read", params: uuidParams("schemeId") }, async ({ user, params }) => ({
  notes: await listNotes({ user, schemeId: params.schemeId }),
}));

export const POST = route({ permission: "notes:write", params: uuidParams("schemeId"), body: commentSchema }, async ({ user, params, body }) => ({
  note: await addNote({ user, schemeId: params.schemeId, ...body }),
}));
