"use client";

import { Fragment, type KeyboardEvent, useId, useMemo, useState } from "react";
import {
  flexRender,
  getCoreRowModel,
  getExpandedRowModel,
  getFilteredRowModel,
  getGroupedRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnDef,
  type GroupingState,
  type Row,
  type RowSelectionState,
  type SortingState,
  type VisibilityState,
} from "@tanstack/react-table";
import type { FixtureDto } from "@/lib/dto/fixture";
import { RIG_COLUMNS, headerWithUnit, type Units } from "@/lib/rig/columns";
import { compareUnitNumbers } from "@/lib/rig/unit-number";
import { NotesButton } from "@/components/notes/notes-button";
import { UnitCheckCell } from "@/components/checks/unit-check-badge";
import { EditableCell, type Choice } from "./editable-cell";
import { EmptyOrInherited } from "./inherited-value";
import { showValue } from "./cell-value";
import { HistoryLink } from "@/components/revisions/history-link";
import { useLatestRevision } from "@/hooks/use-latest-revision";
import { CHANGED_EDGE, ChangedWords } from "@/components/revisions/revision-marks";

export type TableState = {
  sorting: SortingState;
  grouping: GroupingState;
  visibility: VisibilityState;
  filter: string;
  selection: RowSelectionState;
};

type Props = {
  fixtures: FixtureDto[];
  units: Units;
  productionId: number;
  editable: string[];
  selectable: boolean;
  choices: { position: Choice[]; type: Choice[] };
  /** Weight of one body by type id: a multi-cell unit is one body to hang, however many cells it has. */
  typeWeights: Map<number, number>;
  state: TableState;
  onState: (patch: Partial<TableState>) => void;
  /** Present for a role that may take units out of the rig (asked of the policy by the page). */
  onDelete?: (fixture: FixtureDto) => void;
};

/** One table of every fixture: stored fields beside computed focus values, sort, filter, group and inline edit. */
export function RigTable({
  fixtures,
  units,
  productionId,
  editable,
  selectable,
  choices,
  typeWeights,
  state,
  onState,
  onDelete,
}: Props) {
  const [collapsed, setCollapsed] = useState<Set<string>>(new Set());
  const sinceRevision = useLatestRevision(productionId, "fixtures");
  const bodies = useMemo(() => cellCounts(fixtures), [fixtures]);
  const hangOrder = useMemo(() => {
    const m = new Map<number, number>();
    fixtures.forEach((f) => m.has(f.positionId) || m.set(f.positionId, m.size));
    return m;
  }, [fixtures]);

  const columns = useMemo<ColumnDef<FixtureDto>[]>(() => {
    const defs: ColumnDef<FixtureDto>[] = RIG_COLUMNS.map((c) => ({
      id: c.id,
      header: headerWithUnit(c, units).replace(/ \((m|ft)\)$/, ""),
      accessorFn: (f) => c.value(f),
      sortingFn:
        c.id === "position"
          ? (a, b) => hangOrder.get(a.original.positionId)! - hangOrder.get(b.original.positionId)!
          : c.id === "unitNumber"
            ? (a, b) => compareUnitNumbers(a.original.unitNumber, b.original.unitNumber)
            : "auto",
      sortUndefined: "last",
      getGroupingValue: (f) => String(c.value(f) ?? "—"),
      cell: ({ row }) =>
        editable.includes(c.id) ? (
          <EditableCell
            fixture={row.original}
            column={c}
            units={units}
            productionId={productionId}
            choices={c.id === "position" ? choices.position : c.id === "type" ? choices.type : undefined}
          />
        ) : (
          <span className={`block px-2 ${c.importKey ? "" : "text-muted"}`}>
            {showValue(c.kind, c.value(row.original), units) || (
              <EmptyOrInherited column={c} fixture={row.original} units={units} dash={false} />
            )}
          </span>
        ),
      meta: { computed: !c.importKey },
    }));
    // Open notes on each unit, beside its number (the counts come from one request for the whole table).
    const afterUnit = defs.findIndex((d) => d.id === "unitNumber") + 1;
    // Not "notes": that is the unit's own notes field (a RIG_COLUMNS column).
    defs.splice(afterUnit, 0, {
      id: "openNotes",
      header: "Open notes",
      enableSorting: false,
      enableHiding: false,
      cell: ({ row }) => (
        <span className="flex justify-center px-1">
          <NotesButton
            compact
            cellControl
            productionId={productionId}
            target={{
              subject: "fixture",
              subjectId: row.original.id,
              label: `unit ${row.original.unitNumber}, ${row.original.positionName}`,
            }}
          />
          <HistoryLink
            compact
            productionId={productionId}
            entity="fixture"
            id={row.original.id}
            name={`unit ${row.original.unitNumber} on ${row.original.positionName}`}
          />
        </span>
      ),
    });
    // What the checks flag on each unit, after its notes (one request for the whole table).
    defs.splice(afterUnit + 1, 0, {
      id: "checks",
      header: "Checks",
      enableSorting: false,
      enableHiding: false,
      cell: ({ row }) => (
        <span className="flex justify-center px-1">
          <UnitCheckCell productionId={productionId} fixtureId={row.original.id} />
        </span>
      ),
    });
    if (onDelete) {
      defs.push({
        id: "delete",
        header: () => <span className="sr-only">Delete</span>,
        enableSorting: false,
        enableHiding: false,
        cell: ({ row }) => (
          <span className="flex justify-center px-1 print:hidden">
            <button
              type="button"
              data-cell-control
              aria-label={`Delete unit ${row.original.unitNumber} on ${row.original.positionName}${row.original.cell ? `, cell ${row.original.cell}` : ""}`}
              title="Delete this unit (Undo puts it back)"
              onClick={() => onDelete(row.original)}
              className="min-h-8 min-w-8 rounded px-1 text-muted hover:bg-danger/10 hover:text-danger focus-visible:outline-2 focus-visible:outline-accent pointer-coarse:min-h-11 pointer-coarse:min-w-11"
            >
              <span aria-hidden>✕</span>
            </button>
          </span>
        ),
      });
    }
    if (selectable) {
      defs.unshift({
        id: "select",
        enableSorting: false,
        enableHiding: false,
        header: ({ table }) => (
          <label className={TAP_TARGET}>
            <input
              type="checkbox"
              aria-label="Select every shown fixture"
              checked={table.getIsAllRowsSelected()}
              onChange={table.getToggleAllRowsSelectedHandler()}
            />
          </label>
        ),
        cell: ({ row }) =>
          row.getCanSelect() ? (
            <label className={TAP_TARGET}>
              <input
                type="checkbox"
                data-cell-control
                aria-label={`Select unit ${row.original.unitNumber} on ${row.original.positionName}`}
                checked={row.getIsSelected()}
                onChange={row.getToggleSelectedHandler()}
              />
            </label>
          ) : null,
      });
    }
    return defs;
  }, [units, editable, productionId, choices, selectable, hangOrder, onDelete]);

  const table = useReactTable({
    data: fixtures,
    columns,
    getRowId: (f) => String(f.id),
    state: {
      sorting: state.sorting,
      grouping: state.grouping,
      columnVisibility: state.visibility,
      globalFilter: state.filter,
      rowSelection: state.selection,
      expanded: true,
    },
    onSortingChange: (u) => onState({ sorting: typeof u === "function" ? u(state.sorting) : u }),
    onRowSelectionChange: (u) => onState({ selection: typeof u === "function" ? u(state.selection) : u }),
    onGlobalFilterChange: (v) => onState({ filter: String(v ?? "") }),
    globalFilterFn: (row, _id, filter: string) => {
      const needle = filter.toLowerCase();
      return RIG_COLUMNS.some(
        (c) =>
          state.visibility[c.id] !== false &&
          String(showValue(c.kind, c.value(row.original), units))
            .toLowerCase()
            .includes(needle),
      );
    },
    groupedColumnMode: false,
    enableMultiSort: true,
    isMultiSortEvent: (e) => (e as MouseEvent).shiftKey,
    getCoreRowModel: getCoreRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getGroupedRowModel: getGroupedRowModel(),
    getExpandedRowModel: getExpandedRowModel(),
  });

  const visibleCount = table.getVisibleLeafColumns().length;
  const shownBodies = new Set<string>(); // bodies whose heading row is already drawn in this render
  const renderRow = (row: Row<FixtureDto>, isCell = false) => {
    const changed = sinceRevision.latest && sinceRevision.changed.has(row.original.id) ? sinceRevision.latest : null;
    // The bar goes on the first cell that prints (the selection box does not).
    const edgeAt = row.getVisibleCells()[0]?.column.id === "select" ? 1 : 0;
    return (
      <tr
        key={row.id}
        data-testid="rig-row"
        data-cell={isCell ? (row.original.cell ?? "") : undefined}
        data-changed-since={changed?.label}
        title={changed ? `Changed since revision ${changed.label}` : undefined}
        className={`border-b border-line/60 align-middle hover:bg-raised/50 print:break-inside-avoid ${row.getIsSelected() ? "bg-accent/10" : ""}`}
      >
        {row.getVisibleCells().map((cell, i) => (
          <td
            key={cell.id}
            tabIndex={-1}
            className={`whitespace-nowrap p-0 ${stickyCell(cell.column.id, selectable, "bg-surface")} ${cell.column.id === "select" ? "print:hidden" : ""} ${i === edgeAt && changed ? CHANGED_EDGE : isCell && i === 0 ? "border-l-4 border-l-accent/40" : ""}`}
          >
            {i === edgeAt && changed ? <ChangedWords label={changed.label} /> : null}
            {flexRender(cell.column.columnDef.cell, cell.getContext())}
          </td>
        ))}
      </tr>
    );
  };
  const sortHintId = useId();
  return (
    <div className="overflow-x-auto rounded-lg border border-line bg-surface print:overflow-visible print:border-0">
      {/* biome-ignore lint/a11y/noNoninteractiveElementInteractions: arrow keys move between the cells' own controls (a grid's keys) */}
      <table
        className="w-full border-collapse text-sm print:text-[9pt]"
        data-testid="rig-table"
        onKeyDown={moveBetweenCells}
      >
        <thead className="sticky top-0 bg-raised print:static print:bg-transparent">
          {table.getHeaderGroups().map((hg) => (
            <tr key={hg.id}>
              {hg.headers.map((h) => {
                const sorted = h.column.getIsSorted();
                const computed = (h.column.columnDef.meta as { computed?: boolean } | undefined)?.computed;
                return (
                  <th
                    key={h.id}
                    scope="col"
                    aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
                    className={`whitespace-nowrap border-b border-line px-2 py-1.5 text-left text-xs font-semibold ${stickyCell(h.id, selectable, "bg-raised")} ${computed ? "italic text-muted" : ""} ${h.id === "select" ? "print:hidden" : ""}`}
                  >
                    {h.column.getCanSort() ? (
                      <button
                        type="button"
                        className="inline-flex min-h-8 items-center gap-1 hover:text-accent pointer-coarse:min-h-11 pointer-coarse:min-w-11"
                        onClick={h.column.getToggleSortingHandler()}
                        aria-describedby={sortHintId}
                      >
                        {flexRender(h.column.columnDef.header, h.getContext())}
                        <span aria-hidden className="print:hidden">
                          {sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : ""}
                        </span>
                      </button>
                    ) : (
                      flexRender(h.column.columnDef.header, h.getContext())
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) =>
            row.getIsGrouped() ? (
              <tr key={row.id} className="bg-canvas print:break-after-avoid">
                <th
                  colSpan={visibleCount}
                  scope="colgroup"
                  className="border-b border-line px-2 pb-1 pt-3 text-left text-sm font-semibold"
                >
                  {String(row.groupingValue)}{" "}
                  <span className="font-normal text-muted">
                    · {row.subRows.length} unit{row.subRows.length === 1 ? "" : "s"}
                  </span>
                  {/* The position's own notes, beside its heading. */}
                  {row.groupingColumnId === "position" && row.getLeafRows()[0] ? (
                    <NotesButton
                      className="ml-2"
                      productionId={productionId}
                      target={{
                        subject: "position",
                        subjectId: row.getLeafRows()[0].original.positionId,
                        label: `position ${row.getLeafRows()[0].original.positionName}`,
                      }}
                    />
                  ) : null}
                </th>
              </tr>
            ) : (
              <Fragment key={row.id}>
                {(() => {
                  const key = bodyOf(row.original);
                  const cells = key ? (bodies.get(key) ?? 1) : 1;
                  if (cells < 2) return renderRow(row);
                  const first = !shownBodies.has(key!);
                  shownBodies.add(key!);
                  const open = !collapsed.has(key!);
                  const toggle = () =>
                    setCollapsed((c) => {
                      const n = new Set(c);
                      if (n.has(key!)) n.delete(key!);
                      else n.add(key!);
                      return n;
                    });
                  return (
                    <>
                      {first ? (
                        <tr className="border-b border-line/60 bg-raised/40" data-testid="rig-body">
                          <td colSpan={visibleCount} className="px-2 py-1 text-sm">
                            <button
                              type="button"
                              aria-expanded={open}
                              onClick={toggle}
                              className="inline-flex min-h-8 items-center gap-1 font-semibold pointer-coarse:min-h-11 hover:text-accent print:pointer-events-none"
                            >
                              <span aria-hidden className="inline-block w-3 print:hidden">
                                {open ? "▾" : "▸"}
                              </span>
                              Unit {row.original.unitNumber} on {row.original.positionName} · {row.original.typeName}
                            </button>{" "}
                            <span className="text-muted">
                              — one body of {cells} cells, {formatKg(typeWeights.get(row.original.fixtureTypeId))} to
                              hang (each cell has its own channel and circuit below)
                            </span>
                          </td>
                        </tr>
                      ) : null}
                      {open ? renderRow(row, true) : null}
                    </>
                  );
                })()}
              </Fragment>
            ),
          )}
        </tbody>
      </table>
      {/* Written out rather than a tooltip: a tablet has no hover. */}
      <p id={sortHintId} className="px-2 py-1 text-xs text-muted print:hidden">
        Tap a column's name to sort, again to reverse; Shift adds a second sort.
      </p>
      {table.getRowModel().rows.length === 0 ? <p className="p-4 text-sm text-muted">No fixtures match.</p> : null}
      {/* Always in the page, so the count is read out as the filter is typed. */}
      <p className="sr-only" aria-live="polite" data-testid="rig-filter-count">
        {state.filter ? `${table.getFilteredRowModel().rows.length} of ${fixtures.length} fixtures match` : ""}
      </p>
    </div>
  );
}

/** A checkbox's tap area: the whole cell, at least 44 × 44 CSS px on a touch screen. */
const TAP_TARGET = "flex min-h-8 min-w-11 cursor-pointer items-center justify-center pointer-coarse:min-h-11";

/**
 * The unit and Hung columns stay in view on a narrow screen: the unit sticks at the left (after the
 * 44 px select column), Hung at the right. Opaque so the cells scrolling under them do not show through.
 */
function stickyCell(columnId: string, selectable: boolean, background: string): string {
  if (columnId === "select") return `sticky left-0 z-10 w-11 ${background} print:static`;
  if (columnId === "unitNumber") return `sticky ${selectable ? "left-11" : "left-0"} z-10 ${background} print:static`;
  if (columnId === "hung") return `sticky right-0 z-10 ${background} print:static`;
  return "";
}

/**
 * Arrow keys move between cells like a grid: to the same column's control in the row above or below,
 * or the next control along the row. A cell with no control takes the focus itself (tabIndex -1), so
 * reading along a row never skips a value. Open editors and selects keep their own arrow keys.
 */
function moveBetweenCells(e: KeyboardEvent<HTMLTableElement>) {
  const step = { ArrowUp: [-1, 0], ArrowDown: [1, 0], ArrowLeft: [0, -1], ArrowRight: [0, 1] }[e.key];
  const from = e.target as HTMLElement;
  if (!step || e.altKey || e.ctrlKey || e.metaKey || e.shiftKey) return;
  if (from instanceof HTMLSelectElement || (from instanceof HTMLInputElement && from.type !== "checkbox")) return;
  const td = from.closest("td");
  const tr = td?.parentElement as HTMLTableRowElement | null;
  if (!td || !tr) return;
  const rows = [...(tr.closest("tbody")?.querySelectorAll<HTMLTableRowElement>("tr[data-testid=rig-row]") ?? [])];
  const row = rows[rows.indexOf(tr) + step[0]];
  const target = row?.cells[td.cellIndex + step[1]];
  if (!target) return;
  e.preventDefault();
  (target.querySelector<HTMLElement>("[data-cell-control]") ?? target).focus();
}

const bodyOf = (f: FixtureDto) => (f.bodyKey ? `${f.positionId}|${f.bodyKey}` : null);
const formatKg = (kg: number | undefined) => (kg === undefined ? "weight unknown" : `${kg} kg`);

/** How many cells share each body (position + body key). */
function cellCounts(fixtures: FixtureDto[]) {
  const m = new Map<string, number>();
  for (const f of fixtures) {
    const key = bodyOf(f);
    if (key) m.set(key, (m.get(key) ?? 0) + 1);
  }
  return m;
}
