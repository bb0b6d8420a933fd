import Link from "next/link";

const VIEWS = [
  { id: "sheet", label: "Cue sheet", href: "?" },
  { id: "levels", label: "Levels (read only)", href: "?view=levels" },
] as const;

/** For a role that reads the cues: the stage manager's sheet, or the tracked levels of every cue. */
export function CueViewSwitch({ current }: { current: "sheet" | "levels" }) {
  return (
    <nav aria-label="Cue views" className="no-print mx-auto mb-3 flex max-w-7xl gap-1 print:hidden">
      {VIEWS.map((v) => (
        <Link
          key={v.id}
          href={v.href}
          aria-current={v.id === current ? "page" : undefined}
          className={`inline-flex min-h-10 items-center rounded-md border px-3 text-sm pointer-coarse:min-h-11 ${
            v.id === current ? "border-accent bg-accent text-accent-ink" : "border-line bg-surface hover:bg-raised"
          }`}
        >
          {v.label}
        </Link>
      ))}
    </nav>
  );
}
