"use client";

export default function ErrorPage({ error, reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <main className="mx-auto max-w-md px-6 py-16 text-center">
      <h1 className="text-xl font-semibold">Something went wrong</h1>
      <p className="mt-2 text-sm text-muted">
        {error.message?.includes("database")
          ? "The database is not reachable right now."
          : "The page could not be shown."}{" "}
        Your saved work is safe.
      </p>
      <button type="button" onClick={reset} className="mt-4 rounded-md border border-line px-4 py-2 text-sm">
        Try again
      </button>
    </main>
  );
}
