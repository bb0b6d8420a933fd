"use server";

import { redirect } from "next/navigation";
import { formAction } from "@/lib/auth/member-action";
import { completePasswordReset, requestPasswordReset } from "@/lib/auth/password-reset";
import { landingPathFor } from "@/lib/auth/landing";
import { resetConfirmSchema, resetRequestSchema } from "@/lib/validation/team";

export const requestResetAction = formAction(resetRequestSchema, async ({ email }) => ({
  message: await requestPasswordReset(email),
}));

export const completeResetAction = formAction(resetConfirmSchema, async (input) => {
  const { userId } = await completePasswordReset(input);
  redirect(await landingPathFor(userId));
});
