"use client";

import { useEffect, useMemo, useRef } from "react";
import { createColumnHelper, flexRender, getCoreRowModel, useReactTable } from "@tanstack/react-table";
import { formatCueNumber, formatFadeTime, formatSplitTime } from "@/lib/cues";
import type { CueDto } from "@/lib/data/cues";

const col = createColumnHelper<CueDto>();
const columns = [
  col.accessor("number", { header: "Cue", cell: (c) => <span className="font-semibold tabular-nums">{formatCueNumber(c.getValue())}</span> }),
  col.accessor("label", { header: "Label" }),
  col.accessor("page", { header: "Page" }),
  col.display({ id: "time", header: "Up/down", cell: (c) => formatSplitTime(c.row.original.upTime, c.row.original.downTime) }),
  col.accessor("delay", { header: "Wait", cell: (c) => (c.getValue() ? formatFadeTime(c.getValue()) : "") }),
  col.accessor("follow", { header: "Follow", cell: (c) => (c.getValue() == null ? "" : formatFadeTime(c.getValue()!)) }),
  col.accessor("link", { header: "Link", cell: (c) => (c.getValue() == null ? "" : formatCueNumber(c.getValue()!)) }),
  col.accessor("block", { header: "Block", cell: (c) => (c.getValue() ? "block" : "") }),
  col.display({ id: "moves", header: "Moves", cell: (c) => Object.keys(c.row.original.levels).length || "" }),
];

export function CueListTable({ cues, selectedId, onSelect }: { cues: CueDto[]; selectedId: number | null; onSelect: (id: number) => void }) {
  const data = useMemo(() => cues, [cues]);
  const table = useReactTable({ data, columns, getCoreRowModel: getCoreRowModel(), getRowId: (r) => String(r.id) });
  const box = useRef<HTMLDivElement>(null);
  useEffect(() => {
    box.current?.querySelector('[aria-selected="true"]')?.scrollIntoView({ block: "nearest" });
  }, [selectedId, cues.length]);
  return (
    <div ref={box} className="max-h-72 overflow-auto rounded-lg border border-line bg-surface">
      <table className="w-full border-collapse text-sm" aria-label="Cue list">
        <thead className="sticky top-0 bg-raised">
          {table.getHeaderGroups().map((hg) => (
            <tr key={hg.id} className="text-left text-xs uppercase tracking-wide text-muted">
              {hg.headers.map((h) => <th key={h.id} className="px-2 py-1.5 font-semibold">{flexRender(h.column.columnDef.header, h.getContext())}</th>)}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => {
            const active = row.original.id === selectedId;
            return (
              <tr
                key={row.id}
                data-testid={`cue-row-${formatCueNumber(row.original.number)}`}
                aria-selected={active}
                onClick={() => onSelect(row.original.id)}
                className={`cursor-pointer border-t border-line ${active ? "bg-accent/15 outline outline-1 outline-accent" : "hover:bg-raised"}`}
              >
                {row.getVisibleCells().map((cell) => <td key={cell.id} className="px-2 py-1">{flexRender(cell.column.columnDef.cell, cell.getContext())}</td>)}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
