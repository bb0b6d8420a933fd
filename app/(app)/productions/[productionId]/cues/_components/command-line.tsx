"use client";

import { useRef, useState } from "react";
import { parseEntry, formatCueNumber, cueKey, unpatchedChannels, unpatchedWarning } from "@/lib/cues";
import { useCreateCue, useUpdateCue } from "@/hooks/use-cues";
import type { CueDto } from "@/lib/dto/cue";
import { ApiError } from "@/lib/http/api-client";

/**
 * Typed level entry in Throwline's own syntax (lib/cues/keyboard-entry.ts): "12 75", "1-6 full", "cue 5".
 * A line that sets a channel no unit answers to waits for a second Enter (a typo such as 999 for 99
 * would otherwise add a row of its own to the grid without a word).
 */
export function CommandLine({
  productionId,
  cues,
  selected,
  rigChannels,
  onSelect,
  onTyped,
}: {
  productionId: number;
  cues: CueDto[];
  selected: CueDto | null;
  /** Channels that have at least one unit in the rig. */
  rigChannels: readonly number[];
  onSelect: (id: number) => void;
  onTyped?: (channels: number[]) => void;
}) {
  const [text, setText] = useState("");
  const [feedback, setFeedback] = useState<{ tone: "ok" | "error" | "warn"; text: string } | null>(null);
  // The line waiting for its second Enter, exactly as typed (any change to it asks again).
  const [confirming, setConfirming] = useState<string | null>(null);
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
        const stray = entry.level === null ? [] : unpatchedChannels(entry.channels, rigChannels);
        if (stray.length && confirming !== text) {
          setConfirming(text);
          setFeedback({ tone: "warn", text: unpatchedWarning(stray) });
          input.current?.focus();
          return;
        }
        setConfirming(null);
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
          onChange={(e) => {
            setText(e.target.value);
            if (confirming !== null) {
              setConfirming(null);
              setFeedback(null);
            }
          }}
          onKeyDown={(e) => {
            if (e.key === "Escape" && confirming !== null) {
              setConfirming(null);
              setFeedback({ tone: "ok", text: "Not recorded." });
            }
          }}
          autoComplete="off"
          spellCheck={false}
          placeholder="12 75 · 1-6 full · 3,5 out · 4 track · cue 12.5"
          aria-describedby="level-entry-feedback"
          aria-invalid={feedback?.tone === "error" || undefined}
          className={`min-h-10 flex-1 rounded-md border bg-canvas px-3 font-mono text-ink ${confirming !== null ? "border-caution" : "border-line"}`}
        />
        <button
          type="submit"
          disabled={busy}
          className="min-h-10 rounded-md bg-accent px-4 text-sm font-medium text-accent-ink disabled:opacity-50"
        >
          {confirming !== null ? "Record anyway" : "Enter"}
        </button>
      </div>
      <p
        id="level-entry-feedback"
        role={feedback?.tone === "error" || feedback?.tone === "warn" ? "alert" : "status"}
        aria-live="polite"
        data-tone={feedback?.tone}
        className={`mt-1 min-h-5 text-sm ${feedback?.tone === "error" ? "text-danger" : feedback?.tone === "warn" ? "font-medium text-caution" : "text-muted"}`}
      >
        {feedback?.text}
      </p>
    </form>
  );
}
