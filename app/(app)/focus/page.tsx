import { cookies } from "next/headers";
import { redirect } from "next/navigation";
import { userForPage } from "@/lib/auth/page-guards";
import { getProductionsByUser } from "@/lib/data/productions";
import { LAST_FOCUS_COOKIE, pickFocusProduction } from "@/lib/offline/last-focus";

// The installed app's start (the manifest's start_url): straight into the focus call of the production this
// tablet followed last, or of the person's only production; otherwise the list to choose one from.
export default async function FocusStartPage() {
  const user = await userForPage();
  const [jar, productions] = await Promise.all([cookies(), getProductionsByUser({ userId: user.id })]);
  const id = pickFocusProduction(
    jar.get(LAST_FOCUS_COOKIE)?.value,
    productions.map((p) => p.id),
  );
  redirect(id != null ? `/productions/${id}/focus/call` : "/productions");
}
