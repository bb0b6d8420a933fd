import "server-only";
import type { IssuedInvitation } from "@/lib/data/invitations";
import { appOrigin } from "./links";
import { invitationMessage } from "./messages";
import { sendMail, type SendOutcome } from "./send";

/** The invitation link, mailed to the invited address. A mail server that is down leaves it queued. */
export async function mailInvitation(issued: IssuedInvitation, inviterName: string): Promise<SendOutcome> {
  const { invitation } = issued;
  const link = `${await appOrigin()}/invite/${issued.token}`;
  const message = invitationMessage({
    productionName: issued.productionName,
    role: invitation.role,
    inviterName,
    link,
    expiresAt: new Date(invitation.expiresAt),
  });
  return sendMail({ productionId: invitation.productionId, to: invitation.email, ...message });
}

/** The words an owner sees after sending: sent, or queued with the reason. */
export function deliveryNote(outcome: SendOutcome, email: string): string {
  return outcome.sent
    ? `Invitation sent to ${email}.`
    : `The invitation is saved, but the e-mail to ${email} could not be sent yet (${outcome.error}). It is queued and will be retried.`;
}
