"use server";

import { redirect } from "next/navigation";
import { formAction } from "@/lib/auth/member-action";
import { acceptAndSignIn } from "@/lib/auth/accept-invitation";
import { acceptNewAccountSchema, acceptSignedInSchema } from "@/lib/validation/team";

/** A new account for the invited address, signed in, then the role's landing page. */
export const acceptAsNewAccountAction = formAction(acceptNewAccountSchema, async (input) => {
  const accepted = await acceptAndSignIn(input);
  redirect(accepted.landing);
});

/** The signed-in account joins, then the role's landing page. */
export const acceptSignedInAction = formAction(acceptSignedInSchema, async (input) => {
  const accepted = await acceptAndSignIn(input);
  redirect(accepted.landing);
});
