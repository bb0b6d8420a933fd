"use server";

import { redirect } from "next/navigation";
import { finishSignUpSchema, joinInvitationSchema, signInSchema, signUpRequestSchema } from "@/lib/validation/auth";
import { signInWithPassword, signOut } from "@/lib/auth/sign-in";
import { completeSignUp, requestSignUp } from "@/lib/auth/sign-up";
import { joinPendingInvitation } from "@/lib/auth/accept-invitation";
import { requireUser } from "@/lib/auth/guards";
import { landingPathFor } from "@/lib/auth/landing";
import { formAction } from "@/lib/auth/member-action";

/** A refused sign-in echoes the e-mail only: the password is never sent back to the page. */
export const signInAction = formAction(signInSchema, async (input) => {
  const user = await signInWithPassword(input);
  redirect(await landingPathFor(user.id));
});

/** The same words for every address: the next step is in the mail (see lib/auth/sign-up.ts). */
export const signUpAction = formAction(signUpRequestSchema, async (input) => ({
  message: await requestSignUp(input),
}));

export const finishSignUpAction = formAction(finishSignUpSchema, async (input) => {
  const { landing } = await completeSignUp(input);
  redirect(landing);
});

/** The signed-in account joins a production that invited its address, then lands on its role's tab. */
export const joinInvitationAction = formAction(joinInvitationSchema, async ({ invitationId }) => {
  const user = await requireUser();
  const { landing } = await joinPendingInvitation({ invitationId, userId: user.id });
  redirect(landing);
});

export async function signOutAction() {
  await signOut();
  redirect("/sign-in");
}
