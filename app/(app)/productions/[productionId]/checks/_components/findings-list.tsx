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
        <li key={`${f.area}-${i}`} className="flex gap-3" data-severity={f.severity}>
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
