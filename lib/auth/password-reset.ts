import "server-only";
import { createPasswordReset, consumePasswordReset } from "@/lib/data/password-resets";
import { endUserSessions } from "@/lib/data/sessions";
import { appOrigin } from "@/lib/mail/links";
import { noAccountMessage, passwordResetMessage } from "@/lib/mail/messages";
import { queueMail } from "@/lib/mail/send";
import { clientAddress } from "./client-address";
import { hashPassword } from "./password";
import { countMailRequest } from "./request-limits";
import { clearAccountFailures } from "./sign-in-limits";
import { startSession } from "./sign-in";

/** The one answer to every reset request, whether or not an account uses the address. */
export const RESET_REQUESTED =
  "If a Throwline account uses that address, a link to choose a new password is on its way. Check your e-mail.";

/**
 * A request for a reset link. Known or unknown, the address gets an e-mail (queued, sent after the
 * response) and the page the same answer, so the form cannot be used to learn who has an account.
 * Requests are limited per address and per client (429 with the wait).
 */
export async function requestPasswordReset(email: string): Promise<string> {
  await countMailRequest({ action: "reset", email, client: await clientAddress() });
  const reset = await createPasswordReset(email);
  const origin = await appOrigin();
  const message = reset
    ? passwordResetMessage({ link: `${origin}/reset-password/${reset.token}`, expiresAt: reset.expiresAt })
    : noAccountMessage({
        signUpHint: `To use Throwline, start a production of your own at ${origin}/sign-up or ask a production's owner for an invitation.`,
      });
  await queueMail({ productionId: null, to: email.trim().toLowerCase(), ...message });
  return RESET_REQUESTED;
}

/** Sets the new password, ends every session of the account, and signs this browser in afresh. */
export async function completePasswordReset(input: { token: string; password: string }) {
  const { userId, email } = await consumePasswordReset({
    token: input.token,
    passwordHash: await hashPassword(input.password),
  });
  await endUserSessions({ userId });
  await clearAccountFailures(email);
  await startSession(userId);
  return { userId };
}
