"use client";
// Circuits with their load against rating and continuous limit, the phase totals, and circuit entry.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import type { CircuitLoad, PowerResult } from "@/lib/checks/power";
import type { CircuitDto } from "@/lib/dto/checks";
import { ApiError } from "@/lib/http/api-client";
import { sendCircuit, sendDeleteCircuit, sendNewCircuit, useChecksWrite } from "./use-checks";

const STATUS = {
  ok: ["", "within rating"],
  "over-continuous": ["text-caution", "over the continuous limit"],
  "over-rating": ["font-semibold text-danger", "over its rating"],
} as const;
const POWER_WORDS = { dimmed: "dimmed", "non-dim": "non-dim", constant: "constant power" } as const;
const fmt = (n: number, d = 1) => n.toLocaleString(undefined, { maximumFractionDigits: d, minimumFractionDigits: d });

export function PowerPanel({
  productionId,
  power,
  circuits,
  canEdit,
}: {
  productionId: number;
  power: PowerResult;
  circuits: CircuitDto[];
  canEdit: boolean;
}) {
  const loads = new Map(power.circuits.map((c) => [c.id, c]));
  const update = useChecksWrite(productionId, sendCircuit);
  const remove = useChecksWrite(productionId, (base, id: number) => sendDeleteCircuit(base, id));
  const err = update.error instanceof ApiError ? update.error.message : null;
  return (
    <div className="flex flex-col gap-4">
      <PhaseTable power={power} />
      {circuits.length ? (
        <div className="overflow-x-auto">
          <table className="w-full text-sm" data-testid="circuits-table">
            <thead className="text-left text-xs text-muted">
              <tr>
                <th className="py-1">Circuit</th>
                <th>Phase</th>
                <th>Power</th>
                <th>Rating (A)</th>
                <th>Units</th>
                <th>Load (W / VA)</th>
                <th>Amps</th>
                <th>Status</th>
                <th className="print:hidden">
                  <span className="sr-only">Remove</span>
                </th>
              </tr>
            </thead>
            <tbody>
              {circuits.map((c) => (
                <CircuitRow
                  key={c.id}
                  c={c}
                  load={loads.get(c.id)}
                  canEdit={canEdit}
                  busy={update.isPending || remove.isPending}
                  onRating={(ratingA) => update.mutate({ id: c.id, version: c.version, ratingA })}
                  onPower={(p) => update.mutate({ id: c.id, version: c.version, power: p })}
                  onRemove={() => remove.mutate(c.id)}
                />
              ))}
            </tbody>
          </table>
        </div>
      ) : (
        <p className="text-sm text-muted">
          No circuits entered: power is not checked. Add each circuit or dimmer with its rating; units name it in their
          circuit (or dimmer) field.
        </p>
      )}
      {err ? (
        <p className="text-sm text-danger" aria-live="polite">
          {err}
        </p>
      ) : null}
      {canEdit ? <NewCircuit productionId={productionId} phases={power.electrical.phases} /> : null}
      {power.notCounted.length ? (
        <p className="text-sm text-caution">
          Not counted (no wattage): {power.notCounted.map((u) => u.label).join(", ")}. The totals are incomplete.
        </p>
      ) : null}
    </div>
  );
}

function CircuitRow({
  c,
  load,
  canEdit,
  busy,
  onRating,
  onPower,
  onRemove,
}: {
  c: CircuitDto;
  load?: CircuitLoad;
  canEdit: boolean;
  busy: boolean;
  onRating: (a: number) => void;
  onPower: (p: CircuitDto["power"]) => void;
  onRemove: () => void;
}) {
  const [rating, setRating] = useState(String(c.ratingA));
  const [tone, words] = STATUS[load?.status ?? "ok"];
  return (
    <tr className="border-t border-line" data-circuit={c.name} data-status={load?.status}>
      <td className="py-1 font-medium">{c.name}</td>
      <td>{c.phase ?? "–"}</td>
      <td>
        {canEdit ? (
          <select
            aria-label={`Power of circuit ${c.name}`}
            className="rounded border border-line bg-surface px-1"
            value={c.power}
            disabled={busy}
            onChange={(e) => onPower(e.target.value as CircuitDto["power"])}
          >
            {Object.entries(POWER_WORDS).map(([v, w]) => (
              <option key={v} value={v}>
                {w}
              </option>
            ))}
          </select>
        ) : (
          POWER_WORDS[c.power]
        )}
      </td>
      <td>
        {canEdit ? (
          <input
            aria-label={`Rating of circuit ${c.name} in amps`}
            className="w-20 rounded border border-line bg-surface px-1 tabular-nums"
            inputMode="decimal"
            value={rating}
            disabled={busy}
            onChange={(e) => setRating(e.target.value)}
            onBlur={() => {
              const n = Number(rating);
              if (rating.trim() && n !== c.ratingA) onRating(n);
            }}
            onKeyDown={(e) => {
              if (e.key === "Enter") (e.target as HTMLInputElement).blur();
            }}
          />
        ) : (
          c.ratingA
        )}
      </td>
      <td className="tabular-nums">
        {load?.units ?? 0}
        {load?.notCounted.length ? ` (${load.notCounted.length} not counted)` : ""}
        {load?.accessories.length ? (
          <span className="block text-xs text-muted" data-testid="circuit-accessories">
            {load.accessories
              .map((a) => `+ ${a.kind} on ${a.unit}: ${a.wattage == null ? "not counted" : `${fmt(a.wattage, 0)} VA`}`)
              .join("; ")}
          </span>
        ) : null}
      </td>
      <td className="tabular-nums">{fmt(load?.loadVA ?? 0, 0)}</td>
      <td className="tabular-nums">{fmt(load?.amps ?? 0)}</td>
      <td className={tone}>
        {words}
        {load?.switchModeUnits && c.power === "dimmed" ? (
          <span className="ml-1 font-semibold text-danger">· electronic unit on a dimmer</span>
        ) : null}
      </td>
      <td className="text-right print:hidden">
        {canEdit ? (
          <Button variant="quiet" type="button" onClick={onRemove} disabled={busy}>
            Remove
          </Button>
        ) : null}
      </td>
    </tr>
  );
}

function PhaseTable({ power }: { power: PowerResult }) {
  return (
    <div className="text-sm" data-testid="phase-totals">
      <div className="flex flex-wrap gap-4">
        {power.phases.map((p) => (
          <span key={p.phase} className="rounded-md border border-line px-3 py-2">
            <span className="text-xs text-muted">Phase {p.phase}</span>
            <span className="block text-lg font-semibold tabular-nums">{fmt(p.amps)} A</span>
            <span className="text-xs text-muted">
              {fmt(p.loadVA / 1000, 2)} kW/kVA · {p.circuits} circuits
            </span>
          </span>
        ))}
      </div>
      <p className="mt-2 text-xs text-muted">
        Total {fmt(power.totalVA / 1000, 2)} kW/kVA.
        {power.imbalance != null ? ` Phases ${Math.round(power.imbalance * 100)} % apart (largest vs smallest).` : ""}
        {power.linearNeutralA != null
          ? ` Neutral about ${fmt(power.linearNeutralA)} A if every load were a lamp; electronic loads add to it.`
          : ""}
      </p>
    </div>
  );
}

function NewCircuit({ productionId, phases }: { productionId: number; phases: string[] }) {
  const create = useChecksWrite(productionId, sendNewCircuit);
  const [name, setName] = useState("");
  const [rating, setRating] = useState("");
  const [phase, setPhase] = useState(phases.length === 1 ? "" : phases[0]);
  const [powerKind, setPowerKind] = useState<CircuitDto["power"]>("dimmed");
  const e = create.error instanceof ApiError ? create.error : null;
  return (
    <form
      className="flex flex-wrap items-end gap-2 print:hidden"
      onSubmit={(ev) => {
        ev.preventDefault();
        create.mutate(
          { name, ratingA: Number(rating), phase: phase || null, power: powerKind },
          {
            onSuccess: () => {
              setName("");
            },
          },
        );
      }}
    >
      <label className="flex flex-col gap-1 text-sm">
        <span className="font-medium">Circuit or dimmer</span>
        <input
          className="min-h-10 w-28 rounded-md border border-line bg-surface px-2"
          value={name}
          onChange={(ev) => setName(ev.target.value)}
          aria-invalid={!!e?.fieldErrors.name || undefined}
        />
      </label>
      <label className="flex flex-col gap-1 text-sm">
        <span className="font-medium">Rating (A)</span>
        <input
          className="min-h-10 w-24 rounded-md border border-line bg-surface px-2"
          inputMode="decimal"
          value={rating}
          onChange={(ev) => setRating(ev.target.value)}
          aria-invalid={!!e?.fieldErrors.ratingA || undefined}
        />
      </label>
      {phases.length > 1 ? (
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Phase</span>
          <select
            className="min-h-10 rounded-md border border-line bg-surface px-2"
            value={phase}
            onChange={(ev) => setPhase(ev.target.value)}
          >
            {phases.map((p) => (
              <option key={p} value={p}>
                {p}
              </option>
            ))}
          </select>
        </label>
      ) : null}
      <label className="flex flex-col gap-1 text-sm">
        <span className="font-medium">Power</span>
        <select
          className="min-h-10 rounded-md border border-line bg-surface px-2"
          value={powerKind}
          onChange={(ev) => setPowerKind(ev.target.value as CircuitDto["power"])}
        >
          {Object.entries(POWER_WORDS).map(([v, w]) => (
            <option key={v} value={v}>
              {w}
            </option>
          ))}
        </select>
      </label>
      <Button type="submit" variant="secondary" disabled={create.isPending}>
        Add circuit
      </Button>
      {e ? (
        <span className="text-xs text-danger" aria-live="polite">
          {e.message} {Object.values(e.fieldErrors).flat().join(" ")}
        </span>
      ) : null}
    </form>
  );
}
