"use client";

import { useRef, useState } from "react";
import { parseEntry, formatCueNumber, cueKey } from "@/lib/cues";
import { useCreateCue, useUpdateCue } from "@/hooks/use-cues";
import type { CueDto } from "@/lib/dto/cue";
import { ApiError } from "@/lib/http/api-client";

/** Typed level entry in Throwline's own syntax (lib/cues/keyboard-entry.ts): "12 75", "1-6 full", "cue 5". */
export function CommandLine({
  productionId,
  cues,
  selected,
  onSelect,
  onTyped,
}: {
  productionId: number;
  cues: CueDto[];
  selected: CueDto | null;
  onSelect: (id: number) => void;
  onTyped?: (channels: number[]) => void;
}) {
  const [text, setText] = useState("");
  const [feedback, setFeedback] = useState<{ tone: "ok" | "error"; text: string } | null>(null);
  const create = useCreateCue(productionId);
  const update = useUpdateCue(productionId);
  const input = useRef<HTMLInputElement>(null);
  const busy = create.isPending || update.isPending;

  async function run() {
    try {
      const entry = parseEntry(text);
      if (entry.kind === "cue") {
        const existing = cues.find((c) => cueKey(c.number) === cueKey(entry.number));
        const cue = existing ?? (await create.mutateAsync({ number: entry.number }));
        onSelect(cue.id);
        setFeedback({
          tone: "ok",
          text: existing
            ? `Cue ${formatCueNumber(cue.number)} selected.`
            : `Cue ${formatCueNumber(cue.number)} created; it starts with the look of the cue before.`,
        });
      } else {
        if (!selected) throw new RangeError("Make a cue first: type cue 1 and press Enter");
        const levels = Object.fromEntries(entry.channels.map((ch) => [ch, entry.level]));
        await update.mutateAsync({ id: selected.id, version: selected.version, changes: { levels } });
        onTyped?.(entry.channels);
        const chans =
          entry.channels.length > 3 ? `${entry.channels[0]}–${entry.channels.at(-1)}` : entry.channels.join(", ");
        setFeedback({
          tone: "ok",
          text: `Cue ${formatCueNumber(selected.number)}: channel${entry.channels.length > 1 ? "s" : ""} ${chans} ${entry.level === null ? "now track" : `at ${entry.level} %`}.`,
        });
      }
      setText("");
    } catch (e) {
      const msg =
        e instanceof ApiError && e.status === 409
          ? "Someone else changed this cue first; their version is shown. Type it again."
          : (e as Error).message;
      setFeedback({ tone: "error", text: msg });
    }
    input.current?.focus();
  }

  return (
    <form
      className="rounded-lg border border-line bg-surface p-3"
      onSubmit={(e) => {
        e.preventDefault();
        if (!busy) void run();
      }}
    >
      <label htmlFor="level-entry" className="text-sm font-medium">
        Type levels{selected ? ` for cue ${formatCueNumber(selected.number)}` : ""}
      </label>
      <div className="mt-1 flex gap-2">
        <input
          id="level-entry"
          ref={input}
          value={text}
          onChange={(e) => setText(e.target.value)}
          autoComplete="off"
          spellCheck={false}
          placeholder="12 75 · 1-6 full · 3,5 out · 4 track · cue 12.5"
          aria-describedby="level-entry-feedback"
          className="min-h-10 flex-1 rounded-md border border-line bg-canvas px-3 font-mono text-ink"
        />
        <button
          type="submit"
          disabled={busy}
          className="min-h-10 rounded-md bg-accent px-4 text-sm font-medium text-accent-ink disabled:opacity-50"
        >
          Enter
        </button>
      </div>
      <p
        id="level-entry-feedback"
        role={feedback?.tone === "error" ? "alert" : "status"}
        aria-live="polite"
        className={`mt-1 min-h-5 text-sm ${feedback?.tone === "error" ? "text-danger" : "text-muted"}`}
      >
        {feedback?.text}
      </p>
    </form>
  );
}
