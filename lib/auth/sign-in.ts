import "server-only";
import { AppError } from "@/lib/errors";
import { authenticate, createUser } from "@/lib/data/users";
import { getSession } from "./session";

// One message for an unknown address and a wrong password: the form never reveals which accounts exist.
export const WRONG_CREDENTIALS = "That e-mail and password do not match an account.";

export async function signInWithPassword(input: { email: string; password: string }) {
  const user = await authenticate(input);
  if (!user) throw new AppError("unauthorized", WRONG_CREDENTIALS);
  const session = await getSession();
  Object.assign(session, { userId: user.id, name: user.name, email: user.email });
  await session.save();
  return user;
}

export async function signUpAndSignIn(input: { name: string; email: string; password: string }) {
  const user = await createUser(input);
  const session = await getSession();
  Object.assign(session, { userId: user.id, name: user.name, email: user.email });
  await session.save();
  return user;
}

export async function signOut() {
  const session = await getSession();
  session.destroy();
}
