"use client";

import { useEffect, useMemo, useState } from "react";
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type SortingState,
  type VisibilityState,
} from "@tanstack/react-table";
import { compareCueNumbers, formatCueNumber, formatFadeTime, formatSplitTime } from "@/lib/cues";
import type { CueDto } from "@/lib/dto/cue";
import { useVirtualRows } from "./use-virtual-rows";
import { useSavedTableView } from "./use-saved-table-view";
import { NotesButton } from "@/components/notes/notes-button";
import { HistoryLink } from "@/components/revisions/history-link";
import { TapHint } from "@/components/ui/tap-hint";

const ROW = 30; // px, fixed so long lists render only what is in view

const col = createColumnHelper<CueDto>();
const columns = [
  col.accessor("number", {
    header: "Cue",
    sortingFn: (a, b) => compareCueNumbers(a.original.number, b.original.number),
    enableHiding: false,
    cell: (c) => <span className="font-semibold tabular-nums">{formatCueNumber(c.getValue())}</span>,
  }),
  col.display({
    id: "notes",
    header: "Notes",
    cell: (c) => (
      <span className="flex items-center">
        <NotesButton
          compact
          productionId={(c.table.options.meta as { productionId: number }).productionId}
          target={{
            subject: "cue",
            subjectId: c.row.original.id,
            label: `cue ${formatCueNumber(c.row.original.number)}`,
          }}
        />
        <HistoryLink
          compact
          productionId={(c.table.options.meta as { productionId: number }).productionId}
          entity="cue"
          id={c.row.original.id}
          name={`cue ${formatCueNumber(c.row.original.number)}`}
        />
      </span>
    ),
  }),
  col.accessor("label", { header: "Label" }),
  col.accessor("page", { header: "Page", sortingFn: "alphanumeric", sortUndefined: "last" }),
  col.accessor("upTime", {
    id: "time",
    header: "Up/down",
    cell: (c) => formatSplitTime(c.row.original.upTime, c.row.original.downTime),
  }),
  col.accessor("delay", { header: "Wait", cell: (c) => (c.getValue() ? formatFadeTime(c.getValue()) : "") }),
  col.accessor("follow", {
    header: "Follow",
    sortUndefined: "last",
    cell: (c) => (c.getValue() == null ? "" : formatFadeTime(c.getValue()!)),
  }),
  col.accessor("link", {
    header: "Link",
    sortUndefined: "last",
    cell: (c) => (c.getValue() == null ? "" : formatCueNumber(c.getValue()!)),
  }),
  col.accessor((c) => c.parts.length, { id: "parts", header: "Parts", cell: (c) => c.getValue() || "" }),
  col.accessor("block", { header: "Block", cell: (c) => (c.getValue() ? "block" : "") }),
  col.accessor((c) => Object.keys(c.levels).length, { id: "moves", header: "Moves", cell: (c) => c.getValue() || "" }),
  col.accessor("callNote", {
    header: "Call note",
    sortUndefined: "last",
    cell: (c) =>
      // The cell shows the note's start; the whole note opens with a tap or Enter (no hover on a tablet).
      c.getValue() ? (
        <TapHint hint={c.getValue()!} className="block max-w-48 truncate">
          {c.getValue()}
        </TapHint>
      ) : null,
  }),
];
const HIDDEN_AT_FIRST: VisibilityState = { callNote: false, block: false };

/** The cue list: sort by any column, filter by text, choose the columns (remembered in this browser). */
export function CueListTable({
  productionId,
  cues,
  selectedId,
  onSelect,
}: {
  productionId: number;
  cues: CueDto[];
  selectedId: number | null;
  onSelect: (id: number) => void;
}) {
  const [view, setView] = useSavedTableView(`throwline.cues.list.${productionId}`, {
    sorting: [] as SortingState,
    visibility: HIDDEN_AT_FIRST,
  });
  const [filter, setFilter] = useState("");
  const table = useReactTable({
    data: cues,
    columns,
    getRowId: (r) => String(r.id),
    meta: { productionId },
    state: { sorting: view.sorting, columnVisibility: view.visibility, globalFilter: filter },
    onSortingChange: (u) => setView((v) => ({ ...v, sorting: typeof u === "function" ? u(v.sorting) : u })),
    onColumnVisibilityChange: (u) =>
      setView((v) => ({ ...v, visibility: typeof u === "function" ? u(v.visibility) : u })),
    onGlobalFilterChange: (f) => setFilter(String(f ?? "")),
    globalFilterFn: (row, _id, needle: string) => {
      const c = row.original;
      const hay = [formatCueNumber(c.number), c.label, c.page ?? "", c.callNote ?? "", ...c.parts.map((p) => p.label)]
        .join(" ")
        .toLowerCase();
      return hay.includes(needle.trim().toLowerCase());
    },
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
  });
  const rows = table.getRowModel().rows;
  const virtual = useVirtualRows({ count: rows.length, rowHeight: ROW });
  const selectedRow = useMemo(() => rows.findIndex((r) => r.original.id === selectedId), [rows, selectedId]);
  const { scrollToIndex } = virtual;
  useEffect(() => scrollToIndex(selectedRow), [selectedRow, scrollToIndex]);

  return (
    <section aria-label="Cue list" className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-2">
        <input
          type="search"
          value={filter}
          onChange={(e) => setFilter(e.target.value)}
          placeholder="Filter: number, label, page, note …"
          aria-label="Filter cues"
          className="min-h-10 w-64 rounded-md border border-line bg-surface px-3 text-sm"
        />
        <details className="relative">
          <summary className="inline-flex min-h-10 cursor-pointer items-center rounded-md border border-line bg-surface px-3 text-sm hover:bg-raised">
            Columns ({table.getVisibleLeafColumns().length})
          </summary>
          <fieldset className="absolute z-20 mt-1 grid w-56 grid-cols-2 gap-1 rounded-md border border-line bg-surface p-3 text-sm shadow-lg">
            <legend className="sr-only">Columns to show</legend>
            {table
              .getAllLeafColumns()
              .filter((c) => c.getCanHide())
              .map((c) => (
                <label key={c.id} className="flex items-center gap-1">
                  <input type="checkbox" checked={c.getIsVisible()} onChange={c.getToggleVisibilityHandler()} />
                  {String(c.columnDef.header)}
                </label>
              ))}
          </fieldset>
        </details>
        {view.sorting.length ? (
          <button type="button" className="text-sm text-accent underline" onClick={() => table.resetSorting()}>
            Back to cue order
          </button>
        ) : null}
        <span id="cue-sort-hint" className="text-xs text-muted">
          Tap a column's name to sort, again to reverse; Shift adds a second sort.
        </span>
        <span className="text-xs text-muted" role="status">
          {rows.length === cues.length ? `${cues.length} cues` : `${rows.length} of ${cues.length} cues`}
        </span>
      </div>
      <div
        ref={virtual.ref}
        onScroll={virtual.onScroll}
        className="max-h-72 overflow-auto rounded-lg border border-line bg-surface"
        data-testid="cue-list-scroll"
      >
        <table className="w-full border-collapse text-sm" aria-label="Cues" aria-rowcount={rows.length + 1}>
          <thead className="sticky top-0 z-10 bg-raised">
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id} className="text-left text-xs uppercase tracking-wide text-muted">
                {hg.headers.map((h) => {
                  const sorted = h.column.getIsSorted();
                  return (
                    <th
                      key={h.id}
                      scope="col"
                      aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
                      className="px-2 py-1.5 font-semibold"
                    >
                      <button
                        type="button"
                        onClick={h.column.getToggleSortingHandler()}
                        className="inline-flex items-center gap-1 uppercase hover:text-accent"
                        aria-describedby="cue-sort-hint"
                      >
                        {flexRender(h.column.columnDef.header, h.getContext())}
                        <span aria-hidden>{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : ""}</span>
                      </button>
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {virtual.padTop ? <tr aria-hidden style={{ height: virtual.padTop }} /> : null}
            {rows.slice(virtual.first, virtual.last).map((row, k) => {
              const active = row.original.id === selectedId;
              return (
                <tr
                  key={row.id}
                  style={{ height: ROW }}
                  aria-rowindex={virtual.first + k + 2}
                  data-testid={`cue-row-${formatCueNumber(row.original.number)}`}
                  aria-selected={active}
                  // Keyboard: the chosen row (or the first) is the one tab stop; Up/Down move and choose, Enter or Space chooses.
                  tabIndex={active || (selectedId == null && virtual.first + k === 0) ? 0 : -1}
                  onClick={() => onSelect(row.original.id)}
                  onKeyDown={(e) => {
                    if (e.key === "Enter" || e.key === " ") {
                      e.preventDefault();
                      onSelect(row.original.id);
                    }
                    const next =
                      e.key === "ArrowDown"
                        ? e.currentTarget.nextElementSibling
                        : e.key === "ArrowUp"
                          ? e.currentTarget.previousElementSibling
                          : null;
                    if (next instanceof HTMLTableRowElement && next.dataset.testid?.startsWith("cue-row-")) {
                      e.preventDefault();
                      next.focus();
                      next.click();
                    }
                  }}
                  className={`cursor-pointer border-t border-line focus-visible:outline-2 focus-visible:-outline-offset-2 ${active ? "bg-accent/15 outline outline-1 outline-accent" : "hover:bg-raised"}`}
                >
                  {row.getVisibleCells().map((cell) => (
                    <td key={cell.id} className="whitespace-nowrap px-2">
                      {flexRender(cell.column.columnDef.cell, cell.getContext())}
                    </td>
                  ))}
                </tr>
              );
            })}
            {virtual.padBottom ? <tr aria-hidden style={{ height: virtual.padBottom }} /> : null}
          </tbody>
        </table>
        {!rows.length ? (
          <p className="p-3 text-sm text-muted">{cues.length ? "No cues match the filter." : "No cues yet."}</p>
        ) : null}
      </div>
    </section>
  );
}
