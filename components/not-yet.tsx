/** Said plainly on a tab whose feature has not been built yet. */
export function NotYet({ feature, what }: { feature: string; what: string }) {
  return (
    <main className="mx-auto max-w-3xl px-4 py-10">
      <div className="rounded-lg border border-dashed border-line bg-surface p-6">
        <h2 className="text-lg font-semibold">{feature} is not built yet</h2>
        <p className="mt-2 text-sm text-muted">{what}</p>
        <p className="mt-2 text-sm text-muted">
          Everything else on the production works; this tab will fill in when the feature lands.
        </p>
      </div>
    </main>
  );
}
