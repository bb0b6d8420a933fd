import { route } from "@/lib/http/respond";
import { signOut } from "@/lib/auth/sign-in";

export const POST = route(async () => {
  await signOut();
  return { ok: true };
});
