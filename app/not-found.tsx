import Link from "next/link";

export default function NotFound() {
  return (
    <main className="mx-auto max-w-md px-6 py-16 text-center">
      <h1 className="text-xl font-semibold">Not found</h1>
      <p className="mt-2 text-sm text-muted">There is nothing here, or you are not on this production&apos;s team.</p>
      <Link href="/productions" className="mt-4 inline-block text-accent underline">
        Back to your productions
      </Link>
    </main>
  );
}
