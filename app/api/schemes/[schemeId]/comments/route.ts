import { addComment, listComments } from "@/db/queries/comments";
import { route } from "@/lib/server/guard";
import { commentSchema } from "@/lib/spec/committee";

type Params = { schemeId: string };

export const GET = route<undefined, Params>({ permission: "schemes:read" }, async ({ user, params }) => ({
  comments: await listComments({ user, schemeId: params.schemeId }),
}));

export const POST = route<typeof commentSchema, Params>({ permission: "comments:write", body: commentSchema }, async ({ user, params, body }) => ({
  comment: await addComment({ user, schemeId: params.schemeId, ...body }),
}));
