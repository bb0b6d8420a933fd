"use server";

import { redirect } from "next/navigation";
import { signInSchema, signUpSchema } from "@/lib/validation/auth";
import { signInWithPassword, signOut, signUpAndSignIn } from "@/lib/auth/sign-in";
import { landingPathFor } from "@/lib/auth/landing";
import { formAction } from "@/lib/auth/member-action";

/** A refused sign-in echoes the e-mail only: the password is never sent back to the page. */
export const signInAction = formAction(signInSchema, async (input) => {
  const user = await signInWithPassword(input);
  redirect(await landingPathFor(user.id));
});

export const signUpAction = formAction(signUpSchema, async (input) => {
  await signUpAndSignIn(input);
  redirect("/productions");
});

export async function signOutAction() {
  await signOut();
  redirect("/sign-in");
}
