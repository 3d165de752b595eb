import { acceptInvitation } from "@/db/queries/committee";
import { publicRoute } from "@/lib/server/guard";
import { acceptInvitationSchema } from "@/lib/spec/committee";

/** Public: the invitation's token is the credential. The browser signs in next with the new password. */
export const POST = publicRoute({ body: acceptInvitationSchema }, async ({ body }) => acceptInvitation(body));
