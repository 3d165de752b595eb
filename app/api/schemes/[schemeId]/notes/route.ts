import { addNote, listNotes } from "@/db/queries/comments";
import { route } from "@/lib/server/guard";
import { commentSchema } from "@/lib/spec/committee";

type Params = { schemeId: string };

/** The firm's own notes: no client holds notes:read or notes:write. */
export const GET = route<undefined, Params>({ permission: "notes:read" }, async ({ user, params }) => ({
  notes: await listNotes({ user, schemeId: params.schemeId }),
}));

export const POST = route<typeof commentSchema, Params>({ permission: "notes:write", body: commentSchema }, async ({ user, params, body }) => ({
  note: await addNote({ user, schemeId: params.schemeId, ...body }),
}));
