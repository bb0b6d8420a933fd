import { readJson, route } from "@/lib/http/respond";
import { requestPasswordReset } from "@/lib/auth/password-reset";
import { resetRequestSchema } from "@/lib/validation/team";

/** Public: the same 202 and words whether or not an account uses the address (the address gets a mail either way). */
export const POST = route(async (req) => {
  const { email } = await readJson(req, resetRequestSchema);
  return Response.json({ message: await requestPasswordReset(email) }, { status: 202 });
});
