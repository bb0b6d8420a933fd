"use client";

import { useMemo, useState } from "react";
import Link from "next/link";
import { useQueryClient } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { apiFetch } from "@/lib/http/api-client";
import type { NoteDto } from "@/lib/notes/dto";
import { notesKey } from "../../_components/use-notes";

type Unit = { id: number; channel: number; label: string; type: string; colour: string | null };
type Mark = { result: "good" | "faulty"; fault?: string; noteId?: number };

/** Step through the channels (or a range): one tap marks the unit good or faulty; a fault is written at once as a work note. */
export function ChannelCheckView({ productionId, units }: { productionId: number; units: Unit[] }) {
  const qc = useQueryClient();
  const first = units[0]?.channel ?? 1;
  const last = units.at(-1)?.channel ?? 1;
  const [from, setFrom] = useState(first);
  const [to, setTo] = useState(last);
  const inRange = useMemo(() => units.filter((u) => u.channel >= from && u.channel <= to), [units, from, to]);
  const [index, setIndex] = useState(0);
  const [marks, setMarks] = useState<Record<number, Mark>>({});
  const [fault, setFault] = useState("");
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const unit = inRange[Math.min(index, inRange.length - 1)];

  const mark = async (result: "good" | "faulty") => {
    if (!unit) return;
    setError(null);
    setBusy(true);
    try {
      const r = await apiFetch<{ notes: NoteDto[] }>(`/api/productions/${productionId}/notes/channel-check`, {
        method: "POST",
        json: {
          results: [
            { fixtureId: unit.id, result, ...(result === "faulty" && fault.trim() ? { fault: fault.trim() } : {}) },
          ],
        },
      });
      setMarks((m) => ({ ...m, [unit.id]: { result, fault: fault.trim() || undefined, noteId: r.notes[0]?.id } }));
      if (result === "faulty") qc.invalidateQueries({ queryKey: notesKey(productionId) });
      setFault("");
      setIndex((i) => Math.min(i + 1, inRange.length - 1));
    } catch (e) {
      setError((e as Error).message);
    } finally {
      setBusy(false);
    }
  };
  const counted = inRange.filter((u) => marks[u.id]);
  const faults = counted.filter((u) => marks[u.id].result === "faulty");

  return (
    <main className="mx-auto flex max-w-3xl flex-col gap-4 p-4">
      <Link href={`/productions/${productionId}/notes`} className="text-sm underline">
        All notes
      </Link>
      <h2 className="text-base font-semibold">Channel check</h2>
      <p className="text-sm text-muted">
        Bring each channel up on the board, look at the unit, tap Good or Faulty. Each fault becomes a work note on that
        unit.
      </p>
      <div className="flex flex-wrap items-end gap-3 text-sm">
        <label className="flex flex-col gap-1">
          From channel
          <input
            type="number"
            className="w-24 rounded border border-line bg-raised px-2 py-1"
            value={from}
            min={1}
            onChange={(e) => {
              setFrom(Number(e.target.value) || 1);
              setIndex(0);
            }}
          />
        </label>
        <label className="flex flex-col gap-1">
          to
          <input
            type="number"
            className="w-24 rounded border border-line bg-raised px-2 py-1"
            value={to}
            min={1}
            onChange={(e) => {
              setTo(Number(e.target.value) || 1);
              setIndex(0);
            }}
          />
        </label>
        <span className="text-muted" role="status">
          {counted.length} of {inRange.length} checked · {faults.length} faulty
        </span>
      </div>
      {unit ? (
        <section aria-label="This channel" className="flex flex-col gap-3 rounded-md border border-line bg-surface p-4">
          <p className="text-3xl font-semibold tabular-nums" data-testid="check-channel">
            Channel {unit.channel}
          </p>
          <p>
            {unit.label} · {unit.type}
            {unit.colour ? ` · ${unit.colour}` : ""}
          </p>
          {marks[unit.id] ? (
            <p className="text-sm">
              Marked {marks[unit.id].result}
              {marks[unit.id].fault ? `: ${marks[unit.id].fault}` : ""}.
            </p>
          ) : null}
          <label className="flex flex-col gap-1 text-sm">
            What is wrong (for a fault)
            <input
              className="rounded border border-line bg-raised px-2 py-1"
              value={fault}
              maxLength={300}
              placeholder="no output, colour wrong, flickers…"
              onChange={(e) => setFault(e.target.value)}
            />
          </label>
          <div className="flex flex-wrap gap-3">
            <Button disabled={busy} onClick={() => mark("good")} className="min-w-28">
              Good
            </Button>
            <Button disabled={busy} variant="danger" onClick={() => mark("faulty")} className="min-w-28">
              Faulty
            </Button>
            <Button variant="secondary" disabled={index === 0} onClick={() => setIndex((i) => Math.max(0, i - 1))}>
              Back
            </Button>
            <Button variant="secondary" disabled={index >= inRange.length - 1} onClick={() => setIndex((i) => i + 1)}>
              Skip
            </Button>
          </div>
          {error ? (
            <p role="alert" className="text-danger">
              {error}
            </p>
          ) : null}
        </section>
      ) : (
        <p className="text-sm text-muted">No units with a channel in that range.</p>
      )}
      {faults.length ? (
        <section aria-label="Faults found" className="text-sm">
          <h3 className="font-medium">Faults found</h3>
          <ul>
            {faults.map((u) => (
              <li key={u.id}>
                Channel {u.channel}: {u.label}
                {marks[u.id].fault ? ` — ${marks[u.id].fault}` : ""}
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </main>
  );
}
