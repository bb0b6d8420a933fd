import { requireMember } from "@/lib/auth/guards";
import { collectionRoutes } from "@/lib/http/crud-routes";
import { route } from "@/lib/http/respond";
import { createInvitation, getOpenInvitations } from "@/lib/data/invitations";
import { deliveryNote, mailInvitation } from "@/lib/mail/team-mail";
import { inviteSchema } from "@/lib/validation/team";

type Ctx = { params: Promise<{ productionId: string }> };

/** Open invitations: the owner's to see (addresses of people not yet on the team). */
export const GET = route(async (_req, ctx: Ctx) => {
  const { productionId } = await requireMember((await ctx.params).productionId, "team.manage");
  return { invitations: await getOpenInvitations({ productionId }) };
});

/** Invites an address with a role and mails the link; a mail server that is down leaves it queued (the answer says so). */
export const { POST } = collectionRoutes({
  key: "invitations",
  itemKey: "invitation",
  create: {
    permission: "team.manage",
    schema: inviteSchema,
    run: async ({ productionId, userId, input }) => {
      const issued = await createInvitation({ productionId, userId, ...input });
      const mail = await mailInvitation(issued, issued.invitation.invitedBy ?? "The production's owner");
      return {
        ...issued.invitation,
        mailSent: mail.sent,
        mailError: mail.error ?? null,
        message: deliveryNote(mail, input.email),
      };
    },
  },
});
