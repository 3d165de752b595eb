import { withdrawInvitation } from "@/db/queries/committee";
import { route } from "@/lib/server/guard";

export const DELETE = route<undefined, { invitationId: string }>({ permission: "committee:manage" }, async ({ user, params }) => ({
  invitation: await withdrawInvitation({ user, invitationId: params.invitationId }),
}));
