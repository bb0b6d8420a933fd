import { readJson, route } from "@/lib/http/respond";
import { completePasswordReset } from "@/lib/auth/password-reset";
import { landingPathFor } from "@/lib/auth/landing";
import { resetConfirmSchema } from "@/lib/validation/team";

/** Public: the link's token is the proof. Every other session of the account ends; this one starts. */
export const POST = route(async (req) => {
  const input = await readJson(req, resetConfirmSchema);
  const { userId } = await completePasswordReset(input);
  return { ok: true, landing: await landingPathFor(userId) };
});
