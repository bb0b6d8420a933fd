import { route, readJson } from "@/lib/http/respond";
import { signUpSchema } from "@/lib/validation/auth";
import { signUpAndSignIn } from "@/lib/auth/sign-in";

export const POST = route(async (req) => {
  const input = await readJson(req, signUpSchema);
  const user = await signUpAndSignIn(input);
  return Response.json({ user }, { status: 201 });
});
