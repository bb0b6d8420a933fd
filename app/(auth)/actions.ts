"use server";

import { redirect } from "next/navigation";
import { z } from "zod";
import { signInSchema, signUpSchema } from "@/lib/validation/auth";
import { signInWithPassword, signOut, signUpAndSignIn } from "@/lib/auth/sign-in";
import { landingPathFor } from "@/lib/auth/landing";
import { toAppError } from "@/lib/errors";

export type AuthFormState = { message?: string; fieldErrors?: Record<string, string[]>; values?: Record<string, string> };

export async function signInAction(_prev: AuthFormState, formData: FormData): Promise<AuthFormState> {
  const values = { email: String(formData.get("email") ?? "") };
  const parsed = signInSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return { fieldErrors: z.flattenError(parsed.error).fieldErrors, values };
  let userId: number;
  try {
    userId = (await signInWithPassword(parsed.data)).id;
  } catch (err) {
    return { message: toAppError(err).message, values };
  }
  redirect(await landingPathFor(userId));
}

export async function signUpAction(_prev: AuthFormState, formData: FormData): Promise<AuthFormState> {
  const values = { email: String(formData.get("email") ?? ""), name: String(formData.get("name") ?? "") };
  const parsed = signUpSchema.safeParse(Object.fromEntries(formData));
  if (!parsed.success) return { fieldErrors: z.flattenError(parsed.error).fieldErrors, values };
  try {
    await signUpAndSignIn(parsed.data);
  } catch (err) {
    const e = toAppError(err);
    return { message: e.message, fieldErrors: e.details.fieldErrors, values };
  }
  redirect("/productions");
}

export async function signOutAction() {
  await signOut();
  redirect("/sign-in");
}
