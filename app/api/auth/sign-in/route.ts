import { route, readJson } from "@/lib/http/respond";
import { signInSchema } from "@/lib/validation/auth";
import { signInWithPassword } from "@/lib/auth/sign-in";

export const POST = route(async (req) => {
  const input = await readJson(req, signInSchema);
  const user = await signInWithPassword(input);
  return { user };
});
