"use client";

import { useState } from "react";
import type { FixtureDto } from "@/lib/dto/fixture";
import { ApiError } from "@/lib/http/api-client";
import { useBulkEditRig } from "@/hooks/use-rig";
import { Button } from "@/components/ui/button";

type Kind = "colour" | "channels" | "addresses";

/** One edit over the selected fixtures, in the order they are shown. */
export function BulkBar({
  productionId,
  fixtures,
  selectedIds,
  canPlot,
  canElectrics,
  onDone,
}: {
  productionId: number;
  fixtures: FixtureDto[];
  selectedIds: number[];
  canPlot: boolean;
  canElectrics: boolean;
  onDone: () => void;
}) {
  const bulk = useBulkEditRig(productionId);
  const kinds = [
    ...(canPlot ? (["colour", "channels"] as Kind[]) : []),
    ...(canElectrics ? (["addresses"] as Kind[]) : []),
  ];
  const [kind, setKind] = useState<Kind>(kinds[0]);
  const [colour, setColour] = useState("");
  const [start, setStart] = useState("1");
  const [universe, setUniverse] = useState("1");
  const [message, setMessage] = useState<string | null>(null);
  const order = new Map(fixtures.map((f, i) => [f.id, i]));
  const items = [...selectedIds]
    .sort((a, b) => order.get(a)! - order.get(b)!)
    .map((id) => ({ id, version: fixtures.find((f) => f.id === id)!.version }));

  async function apply() {
    setMessage(null);
    const action =
      kind === "colour"
        ? { kind, colour: colour.trim() || null }
        : kind === "channels"
          ? { kind, start: Number(start), step: 1 }
          : { kind, universe: Number(universe), address: Number(start) };
    try {
      const r = await bulk.mutateAsync({ items, action } as never);
      setMessage(`Changed ${r.updated} fixtures.`);
      onDone();
    } catch (err) {
      setMessage(
        err instanceof ApiError
          ? err.status === 409
            ? "Someone else changed one of these first; nothing was changed. The table now shows the current values."
            : err.message
          : "Could not apply the change.",
      );
    }
  }

  return (
    <div
      className="flex flex-wrap items-end gap-2 rounded-lg border border-accent/50 bg-surface p-3 text-sm print:hidden"
      data-testid="bulk-bar"
    >
      <strong className="self-center">{selectedIds.length} selected</strong>
      <label className="flex flex-col gap-1">
        <span>Change</span>
        <select
          className="min-h-10 rounded-md border border-line bg-surface px-2"
          value={kind}
          onChange={(e) => setKind(e.target.value as Kind)}
        >
          {kinds.includes("colour") ? <option value="colour">colour</option> : null}
          {kinds.includes("channels") ? <option value="channels">channels, counting up</option> : null}
          {kinds.includes("addresses") ? <option value="addresses">DMX addresses, packed by footprint</option> : null}
        </select>
      </label>
      {kind === "colour" ? (
        <label className="flex flex-col gap-1">
          <span>Colour (+ diffusion)</span>
          <input
            className="min-h-10 rounded-md border border-line bg-surface px-2"
            placeholder="pale blue + light frost"
            value={colour}
            onChange={(e) => setColour(e.target.value)}
          />
        </label>
      ) : null}
      {kind === "addresses" ? (
        <label className="flex flex-col gap-1">
          <span>Universe</span>
          <input
            inputMode="numeric"
            className="min-h-10 w-20 rounded-md border border-line bg-surface px-2"
            value={universe}
            onChange={(e) => setUniverse(e.target.value)}
          />
        </label>
      ) : null}
      {kind !== "colour" ? (
        <label className="flex flex-col gap-1">
          <span>{kind === "channels" ? "First channel" : "First address"}</span>
          <input
            inputMode="numeric"
            className="min-h-10 w-24 rounded-md border border-line bg-surface px-2"
            value={start}
            onChange={(e) => setStart(e.target.value)}
          />
        </label>
      ) : null}
      <Button onClick={apply} disabled={bulk.isPending}>
        {bulk.isPending ? "Applying…" : "Apply"}
      </Button>
      {kind === "addresses" ? (
        <span className="self-center text-xs text-muted">
          A unit that would run past slot 512 starts the next universe (DMX512-A).
        </span>
      ) : null}
      {message ? (
        <span role="status" className="self-center">
          {message}
        </span>
      ) : null}
    </div>
  );
}
