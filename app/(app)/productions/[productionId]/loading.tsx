export default function Loading() {
  return (
    <main className="mx-auto max-w-6xl px-4 py-6" aria-busy="true">
      <div className="h-32 animate-pulse rounded-lg bg-raised" />
    </main>
  );
}
