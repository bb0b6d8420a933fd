"use client";
// Data runs: each an ordered list of units. A run is started from a position's units in unit order.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import type { DataLineResult } from "@/lib/checks/dmx";
import type { DataLineDto } from "@/lib/dto/checks";
import { ApiError } from "@/lib/http/api-client";
import { sendDeleteDataLine, sendNewDataLine, useChecksWrite } from "./use-checks";
import type { PositionChoice } from "./checks-view";

export function DataLinesPanel({
  productionId,
  lines,
  results,
  positions,
  canEdit,
}: {
  productionId: number;
  lines: DataLineDto[];
  results: DataLineResult[];
  positions: PositionChoice[];
  canEdit: boolean;
}) {
  const create = useChecksWrite(productionId, sendNewDataLine);
  const remove = useChecksWrite(productionId, (base, id: number) => sendDeleteDataLine(base, id));
  const [positionId, setPositionId] = useState<number | "">("");
  const [universe, setUniverse] = useState("");
  const error = create.error instanceof ApiError ? create.error.message : create.error ? String(create.error) : null;
  const byId = new Map(results.map((r) => [r.id, r]));
  return (
    <div className="mt-4">
      <h3 className="mb-2 text-sm font-semibold">Data runs (EIA-485: up to 32 unit loads a run, from memory)</h3>
      {lines.length ? (
        <table className="w-full text-sm" data-testid="data-lines">
          <thead className="text-left text-xs text-muted">
            <tr>
              <th className="py-1">Run</th>
              <th>Universe</th>
              <th>Devices</th>
              <th>Terminate at</th>
              <th className="print:hidden">
                <span className="sr-only">Remove</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {lines.map((l) => {
              const r = byId.get(l.id);
              return (
                <tr key={l.id} className="border-t border-line">
                  <td className="py-1">{l.name}</td>
                  <td>{l.universe ?? "–"}</td>
                  <td className={r?.overLimit ? "font-semibold text-danger" : ""}>
                    {r?.devices ?? 0}
                    {r?.overLimit ? " (over 32: split the run)" : ""}
                  </td>
                  <td>{r?.lastDevice ?? "–"}</td>
                  <td className="text-right print:hidden">
                    {canEdit ? (
                      <Button
                        variant="quiet"
                        type="button"
                        onClick={() => remove.mutate(l.id)}
                        disabled={remove.isPending}
                      >
                        Remove
                      </Button>
                    ) : null}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      ) : (
        <p className="text-sm text-muted">No data runs entered: device counts are not checked.</p>
      )}
      {canEdit ? (
        <form
          className="mt-2 flex flex-wrap items-end gap-2 print:hidden"
          onSubmit={(e) => {
            e.preventDefault();
            const p = positions.find((x) => x.id === positionId);
            if (!p) return;
            create.mutate({
              name: `${p.name} run${lines.some((l) => l.name === `${p.name} run`) ? ` ${lines.length + 1}` : ""}`.slice(
                0,
                60,
              ),
              universe: universe ? Number(universe) : null,
              fixtureIds: p.unitIds,
            });
          }}
        >
          <label className="flex flex-col gap-1 text-sm">
            <span className="font-medium">New run along</span>
            <select
              className="min-h-10 rounded-md border border-line bg-surface px-2"
              value={positionId}
              onChange={(e) => setPositionId(e.target.value ? Number(e.target.value) : "")}
            >
              <option value="">choose a position</option>
              {positions.map((p) => (
                <option key={p.id} value={p.id}>
                  {p.name} ({p.unitIds.length} units)
                </option>
              ))}
            </select>
          </label>
          <label className="flex flex-col gap-1 text-sm">
            <span className="font-medium">Universe it carries</span>
            <input
              className="min-h-10 w-28 rounded-md border border-line bg-surface px-2"
              inputMode="numeric"
              value={universe}
              onChange={(e) => setUniverse(e.target.value)}
              placeholder="optional"
            />
          </label>
          <Button type="submit" variant="secondary" disabled={!positionId || create.isPending}>
            Add run
          </Button>
          {error ? (
            <span className="text-xs text-danger" aria-live="polite">
              {error}
            </span>
          ) : null}
        </form>
      ) : null}
    </div>
  );
}
