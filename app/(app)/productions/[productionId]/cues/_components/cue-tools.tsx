"use client";

import { useState } from "react";
import { formatCueNumber, movesToReach, numberBetween, stateOf, type TrackedShow } from "@/lib/cues";
import type { CueDto } from "@/lib/dto/cue";
import { useCreateCue, useDeleteCue, useRenumberCues, useUpdateCue } from "@/hooks/use-cues";
import { Card } from "@/components/ui/card";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { CueImport } from "./cue-import";

const input = "min-h-10 w-20 rounded-md border border-line bg-surface px-2 text-ink";

/** Insert, delete, copy levels, renumber, and the files in and out. */
export function CueTools({
  productionId,
  cues,
  show,
  selected,
  selectedIndex,
  onSelect,
}: {
  productionId: number;
  cues: CueDto[];
  show: TrackedShow;
  selected: CueDto | null;
  selectedIndex: number;
  onSelect: (id: number) => void;
}) {
  const create = useCreateCue(productionId);
  const update = useUpdateCue(productionId);
  const remove = useDeleteCue(productionId);
  const renumber = useRenumberCues(productionId);
  const [copyFrom, setCopyFrom] = useState("");
  const [range, setRange] = useState({ from: "", to: "", start: "", step: "1" });
  const [message, setMessage] = useState<{ tone: "ok" | "error"; text: string } | null>(null);
  const [confirmingId, setConfirmingId] = useState<number | null>(null);
  const act = async (fn: () => Promise<string>) => {
    try {
      setMessage({ tone: "ok", text: await fn() });
    } catch (e) {
      setMessage({ tone: "error", text: (e as Error).message });
    }
  };

  const insertAfter = () =>
    act(async () => {
      const next = selected ? (cues[selectedIndex + 1] ?? null) : null;
      const number = numberBetween(selected?.number ?? cues.at(-1)?.number ?? null, next?.number ?? null);
      if (number === null) throw new Error("No room for a cue between these two numbers: renumber first.");
      const cue = await create.mutateAsync({ number });
      onSelect(cue.id);
      return `Cue ${formatCueNumber(number)} inserted; it starts with the look of the cue before.`;
    });

  const copyLevels = () =>
    act(async () => {
      const source = cues.findIndex((c) => formatCueNumber(c.number) === copyFrom.trim());
      if (source < 0 || !selected) throw new Error(`There is no cue ${copyFrom.trim() || "(empty)"} to copy from.`);
      const before = selectedIndex > 0 ? stateOf(show, selectedIndex - 1) : new Map<number, number>();
      const moves: Record<number, number | null> = movesToReach(before, stateOf(show, source));
      for (const ch of Object.keys(selected.levels)) if (!(ch in moves)) moves[Number(ch)] = null;
      await update.mutateAsync({ id: selected.id, version: selected.version, changes: { levels: moves } });
      return `Cue ${formatCueNumber(selected.number)} now has the look of cue ${copyFrom.trim()}.`;
    });

  return (
    <Card title="Cue tools">
      <div className="flex flex-col gap-3 text-sm">
        <div className="flex flex-wrap gap-2">
          <Button type="button" variant="secondary" onClick={insertAfter}>
            Insert a cue after {selected ? formatCueNumber(selected.number) : "the last"}
          </Button>
          {selected && confirmingId !== selected.id ? (
            <Button
              type="button"
              variant="danger"
              onClick={() => setConfirmingId(selected.id)}
              data-testid="delete-cue"
            >
              Delete cue {formatCueNumber(selected.number)}
            </Button>
          ) : null}
        </div>
        {selected && confirmingId === selected.id ? (
          // A cue's levels, label and timing go with it and there is no undo: ask once, in place.
          <div
            role="alertdialog"
            aria-labelledby="delete-cue-question"
            className="flex flex-wrap items-center gap-2 rounded-md border border-danger/60 bg-surface p-2"
            data-testid="delete-cue-confirm"
          >
            <span id="delete-cue-question">
              Delete cue {formatCueNumber(selected.number)} with its levels and notes? This cannot be undone.
            </span>
            <Button
              type="button"
              variant="danger"
              onClick={() => {
                setConfirmingId(null);
                void act(
                  async () => (
                    await remove.mutateAsync({ id: selected.id, version: selected.version }),
                    `Cue ${formatCueNumber(selected.number)} deleted.`
                  ),
                );
              }}
            >
              Yes, delete cue {formatCueNumber(selected.number)}
            </Button>
            <Button type="button" variant="secondary" onClick={() => setConfirmingId(null)} autoFocus>
              Keep it
            </Button>
          </div>
        ) : null}
        {selected ? (
          <form className="flex flex-wrap items-end gap-2" onSubmit={(e) => (e.preventDefault(), copyLevels())}>
            <label className="flex flex-col gap-1">
              Copy the look of cue
              <input
                value={copyFrom}
                onChange={(e) => setCopyFrom(e.target.value)}
                className={input}
                aria-label="Copy the look of cue"
              />
            </label>
            <Button type="submit" variant="secondary">
              Copy into {formatCueNumber(selected.number)}
            </Button>
          </form>
        ) : null}
        <form
          className="flex flex-wrap items-end gap-2"
          onSubmit={(e) => (
            e.preventDefault(), act(async () => `${(await renumber.mutateAsync(range)).renumbered} cues renumbered.`)
          )}
        >
          {(["from", "to", "start", "step"] as const).map((k) => (
            <label key={k} className="flex flex-col gap-1">
              {{ from: "Renumber from", to: "to", start: "as", step: "step" }[k]}
              <input
                value={range[k]}
                onChange={(e) => setRange({ ...range, [k]: e.target.value })}
                className={input}
                aria-label={`Renumber ${k}`}
              />
            </label>
          ))}
          <Button type="submit" variant="secondary">
            Renumber
          </Button>
        </form>
        <FormMessage message={message?.text} tone={message?.tone} />
        <div className="flex flex-wrap items-center gap-3 border-t border-line pt-3">
          <span className="font-medium">Take the cues away as</span>
          {(["ascii", "csv", "xlsx", "patch"] as const).map((f) => (
            <a
              key={f}
              href={`/api/productions/${productionId}/cues/export?format=${f}`}
              className="text-accent underline"
              download
            >
              {{ ascii: "USITT ASCII (with the patch)", csv: "CSV", xlsx: "Excel", patch: "Patch as CSV" }[f]}
            </a>
          ))}
        </div>
        <CueImport productionId={productionId} />
      </div>
    </Card>
  );
}
