import { readJson, route } from "@/lib/http/respond";
import { signUpRequestSchema } from "@/lib/validation/auth";
import { requestSignUp } from "@/lib/auth/sign-up";

/**
 * Public: asks for an account. The same 202 and words whether or not an account uses the address; the
 * address gets a link to finish, or (if it has an account) a note with a reset link. Limited per
 * address and per client (429 with Retry-After).
 */
export const POST = route(async (req) => {
  const input = await readJson(req, signUpRequestSchema);
  return Response.json({ message: await requestSignUp(input) }, { status: 202 });
});
