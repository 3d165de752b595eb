import { inviteToCommittee, listInvitations } from "@/db/queries/committee";
import { route } from "@/lib/server/guard";
import { inviteSchema } from "@/lib/spec/committee";

type Params = { projectId: string };

export const GET = route<undefined, Params>({ permission: "committee:manage" }, async ({ user, params }) => ({
  invitations: await listInvitations({ user, projectId: params.projectId }),
}));

/** Invites by e-mail; an existing committee account is added at once ({ kind: "added" }). */
export const POST = route<typeof inviteSchema, Params>({ permission: "committee:manage", body: inviteSchema }, async ({ user, params, body }) =>
  inviteToCommittee({ user, projectId: params.projectId, email: body.email, name: body.name }),
);
