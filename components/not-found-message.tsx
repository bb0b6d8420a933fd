import Link from "next/link";

/** The words of a not-found page; the signed-in header around it comes from whichever layout renders it. */
export function NotFoundMessage({ signedIn }: { signedIn: boolean }) {
  return (
    <main className="mx-auto max-w-md px-6 py-16 text-center">
      <h1 className="text-xl font-semibold">Not found</h1>
      <p className="mt-2 text-sm text-muted">There is nothing here, or you are not on this production&apos;s team.</p>
      <Link href={signedIn ? "/productions" : "/sign-in"} className="mt-4 inline-block text-accent underline">
        {signedIn ? "Back to your productions" : "Sign in"}
      </Link>
    </main>
  );
}
