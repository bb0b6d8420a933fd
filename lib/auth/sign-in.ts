import "server-only";
import { headers } from "next/headers";
import { AppError } from "@/lib/errors";
import { authenticate, createUser } from "@/lib/data/users";
import { createSessionRecord, endSessionRecord } from "@/lib/data/sessions";
import { assertSignInAllowed, clearAccountFailures, recordSignInFailure } from "./sign-in-limits";
import { getSession, SESSION_TTL_SECONDS } from "./session";

// One message for an unknown address and a wrong password: the form never reveals which accounts exist.
export const WRONG_CREDENTIALS = "That e-mail and password do not match an account.";

/**
 * The address a request came from. Next's server sets X-Forwarded-For to the peer's address; behind a load
 * balancer, the balancer's own entry is the first. Only the per-address limit uses it.
 */
async function clientAddress(): Promise<string> {
  const h = await headers();
  return h.get("x-forwarded-for")?.split(",")[0].trim() || h.get("x-real-ip") || "unknown";
}

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

export async function signUpAndSignIn(input: { name: string; email: string; password: string }) {
  const user = await createUser(input);
  await startSession(user.id);
  return user;
}

/** Ends the session on the server as well as in the browser: the cookie, replayed, is signed out. */
export async function signOut() {
  const session = await getSession();
  if (session.token) await endSessionRecord(session.token);
  session.destroy();
}
