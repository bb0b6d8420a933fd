import { readJson, route } from "@/lib/http/respond";
import { requireUser } from "@/lib/auth/guards";
import { joinInvitationSchema } from "@/lib/validation/auth";
import { joinPendingInvitation } from "@/lib/auth/accept-invitation";

/** Signed in: joins a production that invited the account's own address; another address's invitation is 404. */
export const POST = route(async (req) => {
  const user = await requireUser();
  const { invitationId } = await readJson(req, joinInvitationSchema);
  const joined = await joinPendingInvitation({ invitationId, userId: user.id });
  return Response.json({ membership: { ...joined, userId: user.id }, landing: joined.landing }, { status: 201 });
});
