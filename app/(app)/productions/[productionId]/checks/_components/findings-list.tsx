"use client";
import type { Finding } from "@/lib/checks/types";

const TONE = {
  error: "border-danger text-danger",
  warning: "border-caution text-caution",
  info: "border-line text-muted",
} as const;
const WORD = { error: "Fix", warning: "Look", info: "Note" } as const;

export function FindingsList({ findings }: { findings: Finding[] }) {
  if (!findings.length) return <p className="text-sm text-muted">No findings here.</p>;
  return (
    <ul className="flex flex-col gap-1 text-sm" data-testid="checks-findings">
      {findings.map((f, i) => (
        // A unit's badge on the plot or the rig table links here by the finding's key.
        <li
          key={f.key ?? `${f.area}-${i}`}
          id={f.key}
          className="flex scroll-mt-24 gap-3 rounded target:ring-2 target:ring-accent"
          data-severity={f.severity}
        >
          <span
            className={`h-fit w-12 shrink-0 rounded border px-1 text-center text-xs font-semibold uppercase ${TONE[f.severity]}`}
          >
            {WORD[f.severity]}
          </span>
          <span>
            <span className="font-medium">{f.subject}:</span> {f.message}
          </span>
        </li>
      ))}
    </ul>
  );
}
