import { redirect } from "next/navigation";
import { getCurrentUser } from "@/lib/auth/session";
import { landingPathFor } from "@/lib/auth/landing";

export default async function Home() {
  const user = await getCurrentUser();
  redirect(user ? await landingPathFor(user.id) : "/sign-in");
}
