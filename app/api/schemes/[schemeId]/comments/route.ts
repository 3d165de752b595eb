import { addComment, listComments } from "@/db/queries/comments";
import { route } from "@/lib/server/guard";
import { uuidParams } from "@/lib/server/params";
import { commentSchema } from "@/lib/spec/committee";

export const GET = route({ permission: "schemes:read", params: uuidParams("schemeId") }, async ({ user, params }) => ({
  comments: await listComments({ user, schemeId: params.schemeId }),
}));

export const POST = route({ permission: "comments:write", params: uuidParams("schemeId"), body: commentSchema }, async ({ user, params, body }) => ({
  comment: await addComment({ user, schemeId: params.schemeId, ...body }),
}));
