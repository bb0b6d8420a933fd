import "server-only";
import { AppError } from "@/lib/errors";
import { authenticate } from "@/lib/data/users";
import { createSessionRecord, endSessionRecord } from "@/lib/data/sessions";
import { clientAddress } from "./client-address";
import { assertSignInAllowed, clearAccountFailures, recordSignInFailure } from "./sign-in-limits";
import { getSession, SESSION_TTL_SECONDS } from "./session";

// One message for an unknown address and a wrong password: the form never reveals which accounts exist.
export const WRONG_CREDENTIALS = "That e-mail and password do not match an account.";

/** Signs this browser in as the user (a new server-side session record). */
export async function startSession(userId: number) {
  const session = await getSession();
  session.token = await createSessionRecord({ userId, ttlSeconds: SESSION_TTL_SECONDS });
  await session.save();
}

export async function signInWithPassword(input: { email: string; password: string }) {
  const keys = { account: input.email, address: await clientAddress() };
  await assertSignInAllowed(keys);
  const user = await authenticate(input);
  if (!user) {
    await recordSignInFailure(keys);
    throw new AppError("unauthorized", WRONG_CREDENTIALS);
  }
  await clearAccountFailures(input.email);
  await startSession(user.id);
  return user;
}

/** Ends the session on the server as well as in the browser: the cookie, replayed, is signed out. */
export async function signOut() {
  const session = await getSession();
  if (session.token) await endSessionRecord(session.token);
  session.destroy();
}
