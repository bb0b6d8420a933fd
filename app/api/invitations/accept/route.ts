import { readJson, route } from "@/lib/http/respond";
import { acceptAndSignIn } from "@/lib/auth/accept-invitation";
import { acceptSchema } from "@/lib/validation/team";

/**
 * Public: the link's token is the proof. Signed in, the current account joins; otherwise a name and a
 * password make a new account for the invited address (and sign it in). Used, expired, withdrawn or
 * altered links are refused with nothing written and nobody signed in.
 */
export const POST = route(async (req) => {
  const input = await readJson(req, acceptSchema);
  const accepted = await acceptAndSignIn(input);
  return Response.json(
    {
      membership: { productionId: accepted.productionId, role: accepted.role, userId: accepted.userId },
      landing: accepted.landing,
    },
    { status: 201 },
  );
});
