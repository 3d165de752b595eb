import { deleteEntry } from "@/db/queries/comments";
import { route } from "@/lib/server/guard";

export const DELETE = route<undefined, { noteId: string }>({ permission: "notes:write" }, async ({ user, params }) =>
  deleteEntry({ user, thread: "notes", id: params.noteId }),
);
