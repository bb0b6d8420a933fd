import { route } from "@/lib/http/respond";
import { requireUser } from "@/lib/auth/guards";
import { getInvitationsForAddress } from "@/lib/data/pending-invitations";

/** Signed in: the open invitations addressed to the account's own e-mail. */
export const GET = route(async () => {
  const user = await requireUser();
  return { invitations: await getInvitationsForAddress({ email: user.email }) };
});
