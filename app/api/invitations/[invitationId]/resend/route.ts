import { resendInvitation } from "@/db/queries/committee";
import { route } from "@/lib/server/guard";

export const POST = route<undefined, { invitationId: string }>({ permission: "committee:manage" }, async ({ user, params }) => ({
  invitation: await resendInvitation({ user, invitationId: params.invitationId }),
}));
