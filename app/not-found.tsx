import Link from "next/link";
import { getCurrentUser } from "@/lib/auth/session";
import { SignedInHeader } from "@/components/signed-in-header";

// The root boundary renders outside the signed-in layout, so it brings the header back itself: a person
// who followed a stale link still sees who they are and can go home or sign out.
export default async function NotFound() {
  const user = await getCurrentUser().catch(() => null);
  return (
    <div className="flex min-h-screen flex-col">
      {user ? <SignedInHeader userName={user.name} /> : null}
      <main className="mx-auto max-w-md px-6 py-16 text-center">
        <h1 className="text-xl font-semibold">Not found</h1>
        <p className="mt-2 text-sm text-muted">There is nothing here, or you are not on this production&apos;s team.</p>
        <Link href={user ? "/productions" : "/sign-in"} className="mt-4 inline-block text-accent underline">
          {user ? "Back to your productions" : "Sign in"}
        </Link>
      </main>
    </div>
  );
}
