import { deleteEntry } from "@/db/queries/comments";
import { route } from "@/lib/server/guard";
import { uuidParams } from "@/lib/server/params";

export const DELETE = route({ permission: "notes:write", params: uuidParams("noteId") }, async ({ user, params }) =>
  deleteEntry({ user, thread: "notes", id: params.noteId }),
);
