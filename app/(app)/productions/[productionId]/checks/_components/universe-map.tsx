"use client";
// Each universe as a strip of its 512 slots (ANSI E1.11), coloured by use: free, used, shared on purpose,
// or in conflict. Exact slot ranges are in the export's "Universes" sheet.
import type { SharedStart, UniverseMap as UniverseStrip } from "@/lib/checks/dmx";

const FILL = { used: "var(--accent)", shared: "var(--success)", conflict: "var(--danger)" } as const;

export function UniverseMap({
  universes,
  shared,
  unpatched,
}: {
  universes: UniverseStrip[];
  shared: SharedStart[];
  unpatched: number;
}) {
  return (
    <div className="flex flex-col gap-2">
      <Legend />
      {universes.length ? (
        <ul className="flex flex-col gap-1" data-testid="universe-map">
          {universes.map((u) => (
            <li key={u.universe} className="grid grid-cols-[7rem_1fr_5rem] items-center gap-2 text-xs">
              <span className="font-medium">Universe {u.universe}</span>
              <svg
                viewBox="0 0 512 10"
                preserveAspectRatio="none"
                className="h-4 w-full rounded-sm bg-raised"
                role="img"
                aria-label={`Universe ${u.universe}: ${u.slotsUsed} of 512 slots used`}
              >
                {u.segments.map((s) => (
                  <rect
                    key={s.start}
                    x={s.start - 1}
                    y={0}
                    width={s.end - s.start + 1}
                    height={10}
                    fill={FILL[s.state]}
                  >
                    <title>{`${s.start}–${s.end}: ${s.state}`}</title>
                  </rect>
                ))}
              </svg>
              <span className="tabular-nums text-muted">{u.slotsUsed} / 512</span>
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-muted">No unit is patched yet: nothing to map.</p>
      )}
      <p className="text-sm text-muted">
        {unpatched} unit{unpatched === 1 ? "" : "s"} unpatched.
        {shared.length
          ? ` ${shared.length} start address${shared.length === 1 ? " is" : "es are"} shared on purpose:`
          : ""}
      </p>
      {shared.length ? (
        <ul className="list-disc pl-5 text-xs">
          {shared.slice(0, 50).map((s) => (
            <li key={`${s.universe}/${s.address}/${s.fixtureIds[0]}`}>
              {s.universe}/{s.address}: {s.labels.join(", ")} ({s.why})
            </li>
          ))}
          {shared.length > 50 ? <li>and {shared.length - 50} more (see the export)</li> : null}
        </ul>
      ) : null}
    </div>
  );
}

function Legend() {
  const item = (label: string, color: string) => (
    <span className="inline-flex items-center gap-1">
      <span className="inline-block h-3 w-3 rounded-sm" style={{ background: color }} />
      {label}
    </span>
  );
  return (
    <p className="flex flex-wrap gap-4 text-xs text-muted">
      {item("free", "var(--raised)")}
      {item("used", FILL.used)}
      {item("shared on purpose", FILL.shared)}
      {item("overlap: fix", FILL.conflict)}
    </p>
  );
}
