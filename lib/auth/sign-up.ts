import "server-only";
import { AppError } from "@/lib/errors";
import { finishSignUp, lookUpSignUpLink, SIGN_UP_REFUSALS, startSignUp } from "@/lib/data/sign-ups";
import { issuePasswordReset } from "@/lib/data/password-resets";
import { appOrigin } from "@/lib/mail/links";
import { signUpExistingAccountMessage, signUpMessage } from "@/lib/mail/sign-up-messages";
import { queueMail } from "@/lib/mail/send";
import { clientAddress } from "./client-address";
import { hashPassword } from "./password";
import { countMailRequest } from "./request-limits";
import { startSession } from "./sign-in";

/** The one answer to every sign-up request, whether or not an account already uses the address. */
export const SIGN_UP_REQUESTED =
  "Check your e-mail: we have sent a message to that address with the next step. It can take a minute to arrive.";

/** Where a new account goes first: its invitations, or the choice of starting a production. */
export const WELCOME_PATH = "/welcome";

/**
 * A request to sign up. A new address gets a link that finishes the account; an address that already
 * has one gets a message saying so, with a reset link. Both paths look the address up once, write one
 * link and queue one mail (sent after the response), and the page gets the same words, so neither the
 * answer nor its timing tells who has an account.
 */
export async function requestSignUp(input: { name: string; email: string }): Promise<string> {
  const email = input.email.trim().toLowerCase();
  await countMailRequest({ action: "sign-up", email, client: await clientAddress() });
  const origin = await appOrigin();
  const started = await startSignUp({ email, name: input.name });
  let message: ReturnType<typeof signUpMessage>;
  if (started.kind === "new") {
    message = signUpMessage({
      name: input.name.trim(),
      link: `${origin}/sign-up/${started.token}`,
      expiresAt: started.expiresAt,
    });
  } else {
    const reset = await issuePasswordReset(started.userId);
    message = signUpExistingAccountMessage({
      signInLink: `${origin}/sign-in`,
      resetLink: `${origin}/reset-password/${reset.token}`,
      expiresAt: reset.expiresAt,
    });
  }
  await queueMail({ productionId: null, to: email, ...message });
  return SIGN_UP_REQUESTED;
}

/** Creates the account from a sign-up link with the chosen name and password, and signs this browser in. */
export async function completeSignUp(input: { token: string; name: string; password: string }) {
  // A link that cannot be used is refused before the (deliberately slow) password hash is computed.
  const look = await lookUpSignUpLink(input.token);
  if (look.state !== "open")
    throw new AppError(look.state === "invalid" ? "not_found" : "conflict", SIGN_UP_REFUSALS[look.state]);
  const { userId, email } = await finishSignUp({
    token: input.token,
    name: input.name,
    passwordHash: await hashPassword(input.password),
  });
  await startSession(userId);
  return { userId, email, landing: WELCOME_PATH };
}
