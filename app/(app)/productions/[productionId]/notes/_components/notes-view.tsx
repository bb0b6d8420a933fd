"use client";

import { useMemo, useState } from "react";
import Link from "next/link";
import {
  createColumnHelper,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnFiltersState,
  type SortingState,
} from "@tanstack/react-table";
import { ApiError } from "@/lib/http/api-client";
import type { CurrentCueDto, NoteDto } from "@/lib/notes/dto";
import { personName, subjectLabel, type NoteSubjects } from "@/lib/notes/subjects";
import { KIND_LABELS, NEED_LABELS, PRIORITY_LABELS, STATUS_LABELS } from "@/lib/notes/words";
import {
  CLOSED_STATUSES,
  NOTE_KINDS,
  NOTE_STATUSES,
  type NoteKind,
  type NoteStatus,
  type NoteSubject,
} from "@/models/note-vocabulary";
import { CurrentCueBar } from "./current-cue-bar";
import { NoteForm, type NotePreset } from "./note-form";
import { SpotPanel } from "./spot-panel";
import { useNotes, useNoteWrites } from "./use-notes";

type Rights = { write: boolean; setCurrentCue: boolean; closable: NoteKind[]; channelCheck: boolean };
const col = createColumnHelper<NoteDto>();
const select = "rounded border border-line bg-raised px-2 py-1";
const SUBJECTS: readonly string[] = ["production", "position", "fixture", "cue", "focus_point"];

export function NotesView(props: {
  productionId: number;
  userId: number;
  initial: NoteDto[];
  subjects: NoteSubjects;
  currentCue: CurrentCueDto;
  preset: { subject: string; subjectId: number } | null;
  displayUnits: "metric" | "imperial";
  rights: Rights;
}) {
  const { productionId, subjects, rights } = props;
  const { data: notes } = useNotes(productionId, props.initial);
  const { update } = useNoteWrites(productionId);
  const [filters, setFilters] = useState<ColumnFiltersState>(() =>
    props.preset ? [{ id: "subject", value: `${props.preset.subject}:${props.preset.subjectId}` }] : [],
  );
  const [sorting, setSorting] = useState<SortingState>([]);
  const [message, setMessage] = useState<string | null>(null);
  const [preset, setPreset] = useState<NotePreset | null>(() =>
    props.preset && SUBJECTS.includes(props.preset.subject)
      ? { subject: props.preset.subject as NoteSubject, subjectId: props.preset.subjectId }
      : null,
  );

  const setStatus = async (n: NoteDto, status: NoteStatus) => {
    setMessage(null);
    try {
      await update.mutateAsync({ id: n.id, version: n.version, changes: { status } });
      setMessage(`Note marked ${STATUS_LABELS[status].toLowerCase()}.`);
    } catch (e) {
      setMessage(
        e instanceof ApiError && e.status === 409
          ? "Someone else changed that note first; the list now shows their version."
          : (e as Error).message,
      );
    }
  };

  // biome-ignore lint/correctness/useExhaustiveDependencies: `setStatus` is a new function each render and reads the latest rows itself
  const columns = useMemo(
    () => [
      col.accessor((n) => `${n.subject}:${n.subjectId ?? ""}`, {
        id: "subject",
        header: "About",
        cell: (c) => subjectLabel(c.row.original.subject, c.row.original.subjectId, subjects),
        filterFn: (row, _id, value: string) => `${row.original.subject}:${row.original.subjectId ?? ""}` === value,
      }),
      col.accessor("body", {
        header: "Note",
        cell: (c) => <span className="whitespace-pre-wrap">{c.getValue()}</span>,
      }),
      col.accessor("kind", { header: "Kind", cell: (c) => KIND_LABELS[c.getValue()], filterFn: "equals" }),
      col.accessor("priority", {
        header: "Priority",
        cell: (c) => (
          <span className={c.getValue() === "high" ? "font-semibold text-caution" : ""}>
            {PRIORITY_LABELS[c.getValue()]}
          </span>
        ),
      }),
      col.accessor((n) => (n.ownerId == null ? "" : String(n.ownerId)), {
        id: "owner",
        header: "Owner",
        cell: (c) => personName(c.row.original.ownerId, subjects) || "—",
        filterFn: "equals",
      }),
      col.accessor("status", {
        header: "Status",
        filterFn: (row, _id, value: string) =>
          value === "unfinished" ? !CLOSED_STATUSES.includes(row.original.status) : row.original.status === value,
        cell: (c) => {
          const n = c.row.original;
          const mayClose = rights.closable.includes(n.kind);
          const closed = CLOSED_STATUSES.includes(n.status);
          const allowed = NOTE_STATUSES.filter(
            (s) => s === n.status || (mayClose ? true : !closed && !CLOSED_STATUSES.includes(s)),
          );
          return (
            <label>
              <span className="sr-only">Status of note {n.id}</span>
              <select
                className={select}
                value={n.status}
                disabled={!rights.write || update.isPending || allowed.length < 2}
                onChange={(e) => setStatus(n, e.target.value as NoteStatus)}
                data-testid={`note-status-${n.id}`}
              >
                {allowed.map((s) => (
                  <option key={s} value={s}>
                    {STATUS_LABELS[s]}
                  </option>
                ))}
              </select>
              {n.closedBy != null && n.closedAt ? (
                <span className="block text-xs text-muted">
                  {personName(n.closedBy, subjects)}, {new Date(n.closedAt).toLocaleString()}
                </span>
              ) : null}
            </label>
          );
        },
      }),
      col.accessor((n) => n.needs.map((k) => NEED_LABELS[k]).join(", "), { id: "needs", header: "Needs" }),
      col.accessor((n) => n.dueDate ?? n.dueSession ?? "", {
        id: "due",
        header: "Due",
        cell: (c) => [c.row.original.dueDate, c.row.original.dueSession].filter(Boolean).join(" · "),
      }),
      col.accessor("createdAt", {
        header: "Written",
        cell: (c) => {
          const n = c.row.original;
          return (
            <span className="text-xs">
              {personName(n.authorId, subjects)}, {new Date(n.createdAt).toLocaleString()}
              {n.runningCueNumber ? ` · in cue ${n.runningCueNumber}` : ""}
            </span>
          );
        },
      }),
    ],
    [subjects, rights, update.isPending],
  );

  const table = useReactTable({
    data: notes,
    columns,
    state: { columnFilters: filters, sorting },
    onColumnFiltersChange: setFilters,
    onSortingChange: setSorting,
    getCoreRowModel: getCoreRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });
  const filterOf = (id: string) => (filters.find((f) => f.id === id)?.value as string | undefined) ?? "";
  const setFilter = (id: string, value: string) =>
    setFilters((fs) => [...fs.filter((f) => f.id !== id), ...(value ? [{ id, value }] : [])]);
  const subjectFilter = filterOf("subject");

  return (
    <main className="mx-auto flex max-w-7xl flex-col gap-4 p-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 className="text-base font-semibold">Notes</h2>
        <nav className="flex gap-3 text-sm" aria-label="Notes tools">
          <Link className="underline" href={`/productions/${productionId}/notes/work-call`}>
            Work call
          </Link>
          {rights.channelCheck ? (
            <Link className="underline" href={`/productions/${productionId}/notes/channel-check`}>
              Channel check
            </Link>
          ) : null}
          <Link className="underline" href={`/productions/${productionId}/notes/show-reports`}>
            Show reports
          </Link>
        </nav>
      </div>
      <CurrentCueBar
        productionId={productionId}
        initial={props.currentCue}
        cues={subjects.cue}
        canSet={rights.setCurrentCue}
      />
      {rights.write ? (
        <NoteForm
          key={preset ? `${preset.subject}:${preset.subjectId}:${preset.body ?? ""}` : "blank"}
          productionId={productionId}
          subjects={subjects}
          preset={preset}
        />
      ) : null}
      <SpotPanel
        productionId={productionId}
        cues={subjects.cue}
        displayUnits={props.displayUnits}
        onNote={(c) =>
          setPreset({
            subject: "fixture",
            subjectId: c.fixtureId,
            kind: "focus",
            body: `At this spot: ${c.label} gives ${Math.round(c.lux)} lx. `,
          })
        }
      />
      <section aria-label="Filters" className="flex flex-wrap items-end gap-3 text-sm">
        <label className="flex flex-col gap-1">
          Owner
          <select className={select} value={filterOf("owner")} onChange={(e) => setFilter("owner", e.target.value)}>
            <option value="">anyone</option>
            {subjects.people.map((p) => (
              <option key={p.userId} value={String(p.userId)}>
                {p.name}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1">
          Kind
          <select className={select} value={filterOf("kind")} onChange={(e) => setFilter("kind", e.target.value)}>
            <option value="">any kind</option>
            {NOTE_KINDS.map((k) => (
              <option key={k} value={k}>
                {KIND_LABELS[k]}
              </option>
            ))}
          </select>
        </label>
        <label className="flex flex-col gap-1">
          Status
          <select className={select} value={filterOf("status")} onChange={(e) => setFilter("status", e.target.value)}>
            <option value="">any status</option>
            <option value="unfinished">not finished</option>
            {NOTE_STATUSES.map((s) => (
              <option key={s} value={s}>
                {STATUS_LABELS[s]}
              </option>
            ))}
          </select>
        </label>
        {subjectFilter ? (
          <button
            type="button"
            className="rounded border border-line px-3 py-1"
            onClick={() => setFilter("subject", "")}
          >
            Only{" "}
            {subjectLabel(
              subjectFilter.split(":")[0] as NoteSubject,
              Number(subjectFilter.split(":")[1]) || null,
              subjects,
            )}{" "}
            · show all
          </button>
        ) : null}
        <span className="text-muted" role="status">
          {table.getRowModel().rows.length} of {notes.length} notes
        </span>
      </section>
      {message ? (
        <p role="status" className="text-sm">
          {message}
        </p>
      ) : null}
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm" data-testid="notes-table">
          <thead>
            {table.getHeaderGroups().map((g) => (
              <tr key={g.id} className="border-b border-line">
                {g.headers.map((h) => (
                  <th
                    key={h.id}
                    className="px-2 py-1 font-medium"
                    aria-sort={
                      h.column.getIsSorted() === "asc"
                        ? "ascending"
                        : h.column.getIsSorted() === "desc"
                          ? "descending"
                          : "none"
                    }
                  >
                    <button type="button" onClick={h.column.getToggleSortingHandler()}>
                      {flexRender(h.column.columnDef.header, h.getContext())}
                    </button>
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((r) => (
              <tr key={r.id} className="border-b border-line align-top" data-testid={`note-row-${r.original.id}`}>
                {r.getVisibleCells().map((c) => (
                  <td key={c.id} className="px-2 py-1">
                    {flexRender(c.column.columnDef.cell, c.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {notes.length === 0 ? <p className="p-3 text-sm text-muted">No notes yet.</p> : null}
      </div>
    </main>
  );
}
