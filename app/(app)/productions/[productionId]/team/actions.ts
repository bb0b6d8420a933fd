"use server";

import { revalidatePath } from "next/cache";
import { z } from "zod";
import { memberAction } from "@/lib/auth/member-action";
import { createInvitation, resendInvitation, withdrawInvitation } from "@/lib/data/invitations";
import { changeMemberRole, removeMember } from "@/lib/data/team";
import { deliveryNote, mailInvitation } from "@/lib/mail/team-mail";
import { changeRoleSchema, inviteSchema } from "@/lib/validation/team";

const id = (what: string) =>
  z.coerce
    .number({ error: `${what} is missing` })
    .int()
    .positive({ error: `${what} is missing` });
const teamPath = (productionId: number) => `/productions/${productionId}/team`;

export const inviteAction = memberAction("team.manage", inviteSchema, async (input, { user, productionId }) => {
  const issued = await createInvitation({ productionId, userId: user.id, ...input });
  const mail = await mailInvitation(issued, user.name);
  revalidatePath(teamPath(productionId));
  const note = deliveryNote(mail, issued.invitation.email);
  return {
    message: issued.refreshed ? `${note} (The open invitation was renewed; its earlier link no longer works.)` : note,
    mailSent: mail.sent,
  };
});

export const resendInvitationAction = memberAction(
  "team.manage",
  z.strictObject({ invitationId: id("The invitation") }),
  async (input, { user, productionId }) => {
    const issued = await resendInvitation({ productionId, id: input.invitationId, userId: user.id });
    const mail = await mailInvitation(issued, user.name);
    revalidatePath(teamPath(productionId));
    return { message: deliveryNote(mail, issued.invitation.email) };
  },
);

export const withdrawInvitationAction = memberAction(
  "team.manage",
  z.strictObject({ invitationId: id("The invitation") }),
  async (input, { productionId }) => {
    await withdrawInvitation({ productionId, id: input.invitationId });
    revalidatePath(teamPath(productionId));
    return { message: "Invitation withdrawn; its link no longer works." };
  },
);

export const changeRoleAction = memberAction(
  "team.manage",
  changeRoleSchema.extend({ memberId: id("The member") }),
  async (input, { productionId }) => {
    const member = await changeMemberRole({
      productionId,
      memberId: input.memberId,
      patch: { role: input.role, version: input.version },
    });
    revalidatePath(teamPath(productionId));
    return { message: `${member.name}'s role is changed.` };
  },
);

export const removeMemberAction = memberAction(
  "team.manage",
  z.strictObject({ memberId: id("The member") }),
  async (input, { productionId }) => {
    await removeMember({ productionId, memberId: input.memberId });
    revalidatePath(teamPath(productionId));
    return { message: "Removed from the team." };
  },
);
