import { readJson, route } from "@/lib/http/respond";
import { finishSignUpSchema } from "@/lib/validation/auth";
import { completeSignUp } from "@/lib/auth/sign-up";

/** Public: the mailed link's token is the proof. Creates the account and signs it in; a refused link signs nobody in. */
export const POST = route(async (req) => {
  const input = await readJson(req, finishSignUpSchema);
  const { userId, email, landing } = await completeSignUp(input);
  return Response.json({ user: { id: userId, email, name: input.name.trim() }, landing }, { status: 201 });
});
