import { requireMember } from "@/lib/auth/guards";
import { parseId, route } from "@/lib/http/respond";
import { resendInvitation } from "@/lib/data/invitations";
import { deliveryNote, mailInvitation } from "@/lib/mail/team-mail";

type Ctx = { params: Promise<{ productionId: string; invitationId: string }> };

/** A fresh link and expiry for an open invitation, mailed again (the old link stops working). */
export const POST = route(async (_req, ctx: Ctx) => {
  const params = await ctx.params;
  const { productionId, user } = await requireMember(params.productionId, "team.manage");
  const id = parseId(params.invitationId, "Invitation");
  const issued = await resendInvitation({ productionId, id, userId: user.id });
  const mail = await mailInvitation(issued, user.name);
  return {
    invitation: {
      ...issued.invitation,
      mailSent: mail.sent,
      mailError: mail.error ?? null,
      message: deliveryNote(mail, issued.invitation.email),
    },
  };
});
