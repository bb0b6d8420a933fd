"use client";

import { useEffect, useMemo, useState } from "react";
import { flushSync } from "react-dom";
import Link from "next/link";
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable } from "@tanstack/react-table";
import { useCueSheet, useUpdateCallNote } from "@/hooks/use-cues";
import { useLatestRevision } from "@/hooks/use-latest-revision";
import { CHANGED_EDGE, ChangedWords, RevisionStampLine } from "@/components/revisions/revision-marks";
import { formatChannels, formatCueNumber, formatFadeTime, formatSplitTime } from "@/lib/cues";
import type { CueSheetRow } from "@/lib/dto/cue";
import { ApiError } from "@/lib/http/api-client";
import { Button } from "@/components/ui/button";
import { NoteCell } from "./note-cell";

const col = createColumnHelper<CueSheetRow>();

/** The number, and how the running order reaches it when that is not plain GO on the next number. */
function CueCell({ row }: { row: CueSheetRow }) {
  return (
    <span className="flex flex-col">
      <span className="font-semibold tabular-nums">{formatCueNumber(row.number)}</span>
      {row.linked && row.after != null ? (
        <span className="text-xs text-muted print:text-black">after {formatCueNumber(row.after)} (link)</span>
      ) : null}
      {!row.reached ? <span className="text-xs text-caution">skipped: a link jumps past it</span> : null}
    </span>
  );
}

function TimeCell({ row }: { row: CueSheetRow }) {
  return (
    <span className="flex flex-col tabular-nums">
      <span>
        {formatSplitTime(row.upTime, row.downTime)}
        {row.delay ? ` · wait ${formatFadeTime(row.delay)}` : ""}
      </span>
      {row.parts.map((p) => (
        <span
          key={p.part}
          className="text-xs text-muted print:text-black"
          data-testid={`sheet-part-${formatCueNumber(row.number)}-${p.part}`}
        >
          part {p.part}
          {p.label ? ` ${p.label}` : ""}: {formatSplitTime(p.upTime, p.downTime)}
          {p.delay ? ` wait ${formatFadeTime(p.delay)}` : ""} · ch {formatChannels(p.channels) || "none"}
        </span>
      ))}
    </span>
  );
}

function ThenCell({ row }: { row: CueSheetRow }) {
  const lines = [
    row.follow != null ? `next cue after ${formatFadeTime(row.follow)} s` : "",
    row.link != null && !row.brokenLink && row.loopsTo == null ? `goes on to ${formatCueNumber(row.link)}` : "",
    row.loopsTo != null ? `back to ${formatCueNumber(row.loopsTo)} (loop)` : "",
    row.brokenLink ? `link to ${formatCueNumber(row.link!)}: no such cue` : "",
  ].filter(Boolean);
  return (
    <span className="flex flex-col">
      {lines.map((l) => (
        <span key={l} className={l.includes("no such") ? "text-danger" : ""}>
          {l}
        </span>
      ))}
    </span>
  );
}

/** A CSS string literal: quotes, backslashes and line breaks escaped, so any production name is safe in `content`. */
const cssString = (text: string) => `"${text.replace(/[\\"]/g, "\\$&").replace(/[\r\n]+/g, " ")}"`;

/**
 * Page margin boxes for the printed sheet: the production top left, when it was printed top right, and
 * "page x of y" at the foot (Chromium fills counter(pages) when it lays out the print).
 */
export function printPageCss(o: { paper: string; productionName: string; printedAt: string }): string {
  const box = "font: 8pt system-ui, sans-serif; color: #000;";
  return `@page { size: ${o.paper}; margin: 16mm 12mm;
  @top-left { content: ${cssString(o.productionName)} " · cue sheet"; ${box} }
  @top-right { content: ${cssString(`printed ${o.printedAt}`)}; ${box} }
  @bottom-right { content: "page " counter(page) " of " counter(pages); ${box} }
}`;
}

const stamp = (d: Date) =>
  d.toLocaleString(undefined, { day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit" });

/** The stage manager's cue sheet: read-only except page and call note; prints on A4 or Letter. */
export function CueSheetView({
  productionId,
  productionName,
  canEditNotes,
  canWriteCues,
}: {
  productionId: number;
  productionName: string;
  canEditNotes: boolean;
  canWriteCues: boolean;
}) {
  const { data, error } = useCueSheet(productionId);
  const sinceRevision = useLatestRevision(productionId, "cues");
  const revisionLabel = sinceRevision.latest ? ` · revision ${sinceRevision.latest.label}` : "";
  const update = useUpdateCallNote(productionId);
  const [paper, setPaper] = useState<"A4" | "letter">("A4");
  const [message, setMessage] = useState<string | null>(null);
  // The printed time is the moment of printing, not of opening the page: refreshed as the print starts.
  // Empty on the server: its clock and time zone are not the reader's (and the HTML must match the first render).
  const [printedAt, setPrintedAt] = useState("");
  useEffect(() => {
    setPrintedAt(stamp(new Date()));
    const before = () => flushSync(() => setPrintedAt(stamp(new Date())));
    window.addEventListener("beforeprint", before);
    return () => window.removeEventListener("beforeprint", before);
  }, []);

  const save = async (row: CueSheetRow, field: "page" | "callNote", value: string) => {
    const next = value.trim() === "" ? null : value.trim();
    if (next === row[field]) return;
    setMessage(null);
    try {
      await update.mutateAsync({ id: row.id, version: row.version, changes: { [field]: next } });
      setMessage(`Cue ${formatCueNumber(row.number)}: ${field === "page" ? "page" : "call note"} saved.`);
    } catch (e) {
      setMessage(
        e instanceof ApiError && e.status === 409
          ? `Cue ${formatCueNumber(row.number)} was changed by someone else; showing their version.`
          : (e as Error).message,
      );
    }
  };

  const group = useMemo(() => {
    const m = new Map<number, { label: string; first: boolean; size: number }>();
    for (const g of data?.standbys ?? [])
      g.cueIds.forEach((id, i) => m.set(id, { label: g.label, first: i === 0, size: g.cueIds.length }));
    return m;
  }, [data]);

  // biome-ignore lint/correctness/useExhaustiveDependencies: the columns are rebuilt when the data or the right changes; `save` is a new function each render and reads the latest rows itself
  const columns = useMemo(
    () => [
      col.accessor("number", { header: "Cue", cell: (c) => <CueCell row={c.row.original} /> }),
      col.accessor("page", {
        header: "Page",
        cell: (c) => (
          <NoteCell
            label={`Page for cue ${formatCueNumber(c.row.original.number)}`}
            value={c.getValue()}
            editable={canEditNotes}
            narrow
            onSave={(v) => save(c.row.original, "page", v)}
          />
        ),
      }),
      col.accessor("label", { header: "Label" }),
      col.display({ id: "time", header: "Time (up/down)", cell: (c) => <TimeCell row={c.row.original} /> }),
      col.display({ id: "then", header: "Then", cell: (c) => <ThenCell row={c.row.original} /> }),
      col.accessor("runningTime", {
        header: "Runs",
        cell: (c) => <span className="tabular-nums">{formatFadeTime(c.getValue())}</span>,
      }),
      col.accessor("summary", {
        header: "What changes",
        cell: (c) => <span className="text-muted print:text-black">{c.getValue()}</span>,
      }),
      col.accessor("callNote", {
        header: "Call note",
        cell: (c) => (
          <NoteCell
            label={`Call note for cue ${formatCueNumber(c.row.original.number)}`}
            value={c.getValue()}
            editable={canEditNotes}
            onSave={(v) => save(c.row.original, "callNote", v)}
          />
        ),
      }),
    ],
    [canEditNotes, data],
  );
  const table = useReactTable({
    data: data?.rows ?? [],
    columns,
    getCoreRowModel: getCoreRowModel(),
    getRowId: (r) => String(r.id),
  });

  if (error)
    return (
      <p role="alert" className="text-danger">
        {(error as Error).message}
      </p>
    );
  return (
    <section aria-labelledby="cue-sheet-title" className="mx-auto max-w-7xl">
      <style>{printPageCss({ paper, productionName: `${productionName}${revisionLabel}`, printedAt })}</style>
      <header className="mb-3 flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 id="cue-sheet-title" className="text-xl font-semibold">
            Cue sheet
          </h2>
          <p className="text-sm text-muted print:text-black">
            <span className="hidden print:inline">{productionName} · </span>
            <RevisionStampLine stamp={sinceRevision.latest} className="print:text-black" /> · {data?.rows.length ?? 0}{" "}
            cues in running order (links followed)
            <span className="print:hidden">
              {" "}
              · standbys grouped when a cue follows within 5 s
              {canEditNotes ? " · you can edit page and call note" : " · page and call note are the stage manager's"}
            </span>
          </p>
        </div>
        <div className="no-print flex items-center gap-2">
          {canWriteCues ? (
            <Link href="?" className="text-sm text-accent underline">
              Back to writing cues
            </Link>
          ) : null}
          <label className="text-sm">
            Paper{" "}
            <select
              value={paper}
              onChange={(e) => setPaper(e.target.value as "A4" | "letter")}
              className="min-h-10 rounded-md border border-line bg-surface px-2"
            >
              <option value="A4">A4</option>
              <option value="letter">Letter</option>
            </select>
          </label>
          <Button type="button" variant="secondary" onClick={() => window.print()}>
            Print cue sheet
          </Button>
        </div>
      </header>
      <p role="status" aria-live="polite" className="no-print min-h-5 text-sm text-muted">
        {message}
      </p>
      <table className="w-full border-collapse text-sm print:text-[9pt]" data-testid="cue-sheet">
        <thead>
          {table.getHeaderGroups().map((hg) => (
            <tr
              key={hg.id}
              className="border-b border-line text-left text-xs uppercase tracking-wide text-muted print:text-black"
            >
              {hg.headers.map((h) => (
                <th key={h.id} className="px-2 py-2 font-semibold">
                  {flexRender(h.column.columnDef.header, h.getContext())}
                </th>
              ))}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => {
            const g = group.get(row.original.id);
            return [
              g?.first && g.size > 1 ? (
                <tr key={`g${row.id}`} className="break-inside-avoid">
                  <td
                    colSpan={columns.length}
                    className="px-2 pt-3 text-xs font-semibold uppercase tracking-wide text-accent print:text-black"
                  >
                    Standby LX {g.label} — one call
                  </td>
                </tr>
              ) : null,
              <tr
                key={row.id}
                data-testid={`sheet-row-${formatCueNumber(row.original.number)}`}
                className={`break-inside-avoid border-b border-line align-baseline ${g && g.size > 1 ? "border-l-4 border-l-accent print:border-l-black" : ""} ${row.original.reached ? "" : "opacity-70"}`}
              >
                {row.getVisibleCells().map((cell, i) => (
                  <td key={cell.id} className="px-2 py-1.5">
                    {i === 0 && sinceRevision.latest && sinceRevision.changed.has(row.original.id) ? (
                      <span
                        className={`mr-1 inline-block h-4 align-middle ${CHANGED_EDGE}`}
                        title={`Changed since revision ${sinceRevision.latest.label}`}
                        data-changed-since={sinceRevision.latest.label}
                      >
                        <ChangedWords label={sinceRevision.latest.label} />
                      </span>
                    ) : null}
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>,
            ];
          })}
        </tbody>
      </table>
      {data && !data.rows.length ? <p className="mt-4 text-muted">No cues yet.</p> : null}
    </section>
  );
}
