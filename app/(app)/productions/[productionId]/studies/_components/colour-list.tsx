"use client";

import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { ApiError, apiFetch } from "@/lib/http/api-client";
import type { ColourTransmissionDto } from "@/lib/dto/studies";
import { Button } from "@/components/ui/button";

/** The production's colour list: each colour text exactly as typed in the rig, and how much light it passes. */
export function ColourList({
  productionId,
  canEdit,
  initial,
}: {
  productionId: number;
  canEdit: boolean;
  initial: ColourTransmissionDto[];
}) {
  const [rows, setRows] = useState(initial);
  const [name, setName] = useState("");
  const [percent, setPercent] = useState("");
  const [error, setError] = useState<string | null>(null);
  const qc = useQueryClient();
  const base = `/api/productions/${productionId}/studies/colours`;
  const refresh = () => qc.invalidateQueries({ queryKey: ["productions", productionId, "studies"] });

  const add = async (e: React.FormEvent) => {
    e.preventDefault();
    try {
      const { colour } = await apiFetch<{ colour: ColourTransmissionDto }>(base, {
        method: "POST",
        json: { name, percent: Number(percent) },
      });
      setRows((r) => [...r, colour].sort((x, y) => x.name.localeCompare(y.name)));
      setName("");
      setPercent("");
      setError(null);
      refresh();
    } catch (err) {
      setError(
        err instanceof ApiError
          ? [err.message, ...Object.values(err.fieldErrors).flat()].join(" ")
          : "Could not save the colour.",
      );
    }
  };
  const remove = async (row: ColourTransmissionDto) => {
    await apiFetch(`${base}/${row.id}`, { method: "DELETE" }).catch(() => null);
    setRows((r) => r.filter((x) => x.id !== row.id));
    refresh();
  };

  return (
    <details className="rounded-md border border-line bg-surface p-3 text-sm">
      <summary className="cursor-pointer font-medium">Colour list ({rows.length})</summary>
      <p className="mt-1 text-xs text-muted">
        Each unit&apos;s light is multiplied by its colour&apos;s transmission. Type the colour exactly as it is written
        in the rig; stacked filters (&ldquo;a + b&rdquo;) multiply. A colour missing here counts at 100 % and is named
        in a warning.
      </p>
      <ul className="mt-2">
        {rows.map((r) => (
          <li key={r.id} className="flex items-center gap-3 border-t border-line py-1">
            <span className="flex-1">{r.name}</span>
            <span>{r.percent} %</span>
            {canEdit && (
              <Button variant="quiet" onClick={() => remove(r)} aria-label={`Remove ${r.name}`}>
                Remove
              </Button>
            )}
          </li>
        ))}
      </ul>
      {canEdit && (
        <form onSubmit={add} className="mt-2 flex flex-wrap items-end gap-2">
          <label className="flex flex-col text-xs text-muted">
            Colour as typed in the rig
            <input
              className="mt-1 rounded-md border border-line bg-surface px-2 py-1.5 text-sm text-ink"
              value={name}
              onChange={(e) => setName(e.target.value)}
            />
          </label>
          <label className="flex flex-col text-xs text-muted">
            Transmission %
            <input
              type="number"
              min={0}
              max={100}
              step={0.1}
              className="mt-1 w-24 rounded-md border border-line bg-surface px-2 py-1.5 text-sm text-ink"
              value={percent}
              onChange={(e) => setPercent(e.target.value)}
            />
          </label>
          <Button type="submit" variant="secondary">
            Add colour
          </Button>
          <span aria-live="polite" className="text-danger">
            {error}
          </span>
        </form>
      )}
    </details>
  );
}
