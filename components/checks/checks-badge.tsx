import Link from "next/link";
import type { ChecksSummary } from "@/lib/checks";

/**
 * A small link to the checks page showing what they found, for the plot and the rig table. Rendered on the
 * server from a fresh report, so it is as current as the page; it says nothing when there is nothing.
 */
export function ChecksBadge({
  productionId,
  summary,
  className = "",
}: {
  productionId: number;
  summary: ChecksSummary;
  className?: string;
}) {
  if (!summary.errors && !summary.warnings) return null;
  const tone = summary.errors ? "border-danger text-danger" : "border-caution text-caution";
  const parts = [
    summary.errors ? `${summary.errors} to fix` : "",
    summary.warnings ? `${summary.warnings} to look at` : "",
  ].filter(Boolean);
  // Its own landmark: the badge floats over the page, outside the page's main region on the rig table.
  return (
    <aside aria-label="Checks" className={`flex rounded-full print:hidden ${className}`}>
      <Link
        href={`/productions/${productionId}/checks`}
        data-testid="checks-badge"
        data-severity={summary.errors ? "error" : "warning"}
        className={`inline-flex items-center gap-1 rounded-full border bg-surface px-3 py-0.5 text-xs font-semibold ${tone}`}
      >
        <span aria-hidden>▲</span> Checks: {parts.join(", ")}
      </Link>
    </aside>
  );
}
