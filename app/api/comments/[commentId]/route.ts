import { deleteEntry } from "@/db/queries/comments";
import { route } from "@/lib/server/guard";

export const DELETE = route<undefined, { commentId: string }>({ permission: "comments:write" }, async ({ user, params }) =>
  deleteEntry({ user, thread: "comments", id: params.commentId }),
);
