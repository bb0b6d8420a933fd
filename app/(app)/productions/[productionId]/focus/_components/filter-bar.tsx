"use client";

import type { FocusFilter } from "@/lib/focus/filters";
import type { FocusPageData } from "./types";

const field = "min-h-10 rounded-md border border-line bg-surface px-2 text-sm text-ink";

/** Position, channel range, focus point and status; each change goes into the URL so it can be bookmarked. */
export function FilterBar({
  data,
  filter,
  onChange,
}: {
  data: FocusPageData;
  filter: Partial<FocusFilter>;
  onChange: (f: Partial<FocusFilter>) => void;
}) {
  const num = (v: string) => (v.trim() === "" ? undefined : Math.max(1, Math.floor(Number(v))) || undefined);
  return (
    <div className="flex flex-wrap items-end gap-3" role="group" aria-label="Filter charts">
      <label className="flex flex-col text-xs text-muted">
        Position
        <select
          className={field}
          value={filter.position ?? ""}
          onChange={(e) => onChange({ ...filter, position: num(e.target.value) })}
          data-testid="filter-position"
        >
          <option value="">All positions</option>
          {data.positions.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col text-xs text-muted">
        Channels from
        <input
          className={`${field} w-24`}
          inputMode="numeric"
          value={filter.chFrom ?? ""}
          onChange={(e) => onChange({ ...filter, chFrom: num(e.target.value) })}
        />
      </label>
      <label className="flex flex-col text-xs text-muted">
        to
        <input
          className={`${field} w-24`}
          inputMode="numeric"
          value={filter.chTo ?? ""}
          onChange={(e) => onChange({ ...filter, chTo: num(e.target.value) })}
        />
      </label>
      <label className="flex flex-col text-xs text-muted">
        Focus point
        <select
          className={field}
          value={filter.point ?? ""}
          onChange={(e) => onChange({ ...filter, point: num(e.target.value) })}
        >
          <option value="">Any</option>
          {data.points.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col text-xs text-muted">
        Status
        <select
          className={field}
          value={filter.status ?? "all"}
          onChange={(e) => onChange({ ...filter, status: e.target.value as FocusFilter["status"] })}
        >
          <option value="all">All</option>
          <option value="unfocused">Still to focus</option>
          <option value="focused">Focused</option>
        </select>
      </label>
    </div>
  );
}
