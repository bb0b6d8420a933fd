import "server-only";
import { acceptInvitation } from "@/lib/data/invitations";
import { joinInvitedProduction } from "@/lib/data/pending-invitations";
import { LANDING_TAB } from "./roles";
import { getCurrentUser } from "./session";
import { startSession } from "./sign-in";

/** Where a new member of a production goes first: their role's landing tab (a stage manager: the cues). */
export const landingForRole = (productionId: number, role: keyof typeof LANDING_TAB) =>
  `/productions/${productionId}${LANDING_TAB[role] ? `/${LANDING_TAB[role]}` : ""}`;

/**
 * Accepts an invitation for whoever opened the link: a signed-in user joins with their own account; anyone
 * else gets a new account for the invited address and is signed in. A refused link signs nobody in.
 */
export async function acceptAndSignIn(input: { token: string; name?: string; password?: string }) {
  const current = await getCurrentUser();
  const accepted = await acceptInvitation({
    token: input.token,
    signedInUserId: current?.id ?? null,
    newAccount:
      input.name !== undefined && input.password !== undefined
        ? { name: input.name, password: input.password }
        : undefined,
  });
  if (accepted.createdAccount) await startSession(accepted.userId);
  return { ...accepted, landing: landingForRole(accepted.productionId, accepted.role) };
}

/** Joins, as the signed-in account, a production that invited the account's own address (no link needed). */
export async function joinPendingInvitation(a: { invitationId: number; userId: number }) {
  const joined = await joinInvitedProduction(a);
  return { ...joined, landing: landingForRole(joined.productionId, joined.role) };
}
