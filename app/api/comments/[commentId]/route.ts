import { deleteEntry } from "@/db/queries/comments";
import { route } from "@/lib/server/guard";
import { uuidParams } from "@/lib/server/params";

export const DELETE = route({ permission: "comments:write", params: uuidParams("commentId") }, async ({ user, params }) =>
  deleteEntry({ user, thread: "comments", id: params.commentId }),
);
