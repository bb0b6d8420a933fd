"use client";

import { useEffect, useState } from "react";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import type { FocusPatch } from "@/hooks/use-focus";
import { useOutbox } from "@/lib/offline/outbox-context";
import type { FixtureDto } from "@/lib/dto/fixture";
import type { FocusChart } from "@/lib/focus/chart-model";
import type { FocusPageData } from "./types";

function NoteField({
  id,
  label,
  value,
  editable,
  onSave,
  busy,
}: {
  id: string;
  label: string;
  value: string | null;
  editable: boolean;
  onSave: (v: string | null) => void;
  busy: boolean;
}) {
  const [text, setText] = useState(value ?? "");
  useEffect(() => setText(value ?? ""), [value]);
  if (!editable) {
    return (
      <div className="text-sm">
        <div className="text-xs text-muted">{label}</div>
        <p className="whitespace-pre-wrap">{value?.trim() ? value : <span className="italic text-muted">none</span>}</p>
      </div>
    );
  }
  const dirty = text !== (value ?? "");
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-xs text-muted">
        {label}
      </label>
      <textarea
        id={id}
        value={text}
        onChange={(e) => setText(e.target.value)}
        rows={3}
        maxLength={4000}
        className="rounded-md border border-line bg-surface p-2 text-sm text-ink"
      />
      {/* aria-disabled, not disabled: a disabled button drops the focus to the page once the note is saved. */}
      <Button
        type="button"
        variant="secondary"
        aria-disabled={!dirty || busy}
        onClick={() => dirty && !busy && onSave(text.trim() ? text : null)}
        className="self-end"
      >
        Save {label.toLowerCase()}
      </Button>
    </div>
  );
}

/** Mark focused (with time and who) and the two kinds of notes, each editable only where the role allows. */
export function FocusControls({
  fixture,
  chart,
  data,
  onNext,
}: {
  fixture: FixtureDto;
  chart: FocusChart;
  data: FocusPageData;
  onNext: () => void;
}) {
  const outbox = useOutbox();
  const [pending, setPending] = useState(false);
  const [message, setMessage] = useState<{ text: string; tone: "error" | "ok" } | null>(null);
  // biome-ignore lint/correctness/useExhaustiveDependencies: the message belongs to the unit; a new unit clears it
  useEffect(() => setMessage(null), [fixture.id]);

  // Offline (or mid-send failure) the edit waits on the device and the unit moves on all the same.
  const save = async (patch: FocusPatch, then?: () => void) => {
    setPending(true);
    const outcome = await outbox.save(fixture, patch).finally(() => setPending(false));
    if (outcome.kind === "error") return setMessage({ text: outcome.error.message, tone: "error" });
    setMessage({ text: outcome.kind === "saved" ? "Saved." : "Waiting to send: kept on this device.", tone: "ok" });
    then?.();
  };

  return (
    <section
      className="flex flex-col gap-3 rounded-md border border-line bg-surface p-3"
      aria-label="Focus status and notes"
    >
      <p
        className={`text-sm ${fixture.focused ? "font-medium text-success" : "text-muted"}`}
        data-testid="focused-line"
      >
        {chart.focusedLine}
      </p>
      {data.rights.focus ? (
        <div className="flex flex-wrap gap-2">
          {fixture.focused ? (
            <Button
              type="button"
              variant="secondary"
              disabled={pending}
              onClick={() => void save({ focused: false })}
              data-testid="unmark-focused"
            >
              Undo focused
            </Button>
          ) : (
            <>
              <Button
                type="button"
                disabled={pending}
                onClick={() => void save({ focused: true }, onNext)}
                className="min-h-12 px-6 text-base"
                data-testid="mark-focused"
              >
                Focused — next unit
              </Button>
              <Button
                type="button"
                variant="secondary"
                disabled={pending}
                onClick={() => void save({ focused: true })}
                className="min-h-12"
                data-testid="mark-focused-stay"
              >
                Mark focused
              </Button>
            </>
          )}
        </div>
      ) : (
        <p className="text-xs text-muted">
          Your role can read these charts; the electricians and the designer mark units focused.
        </p>
      )}
      <NoteField
        id="as-focused-notes"
        label="As-focused notes"
        value={fixture.focusNotes}
        editable={data.rights.focus}
        busy={pending}
        onSave={(v) => void save({ focusNotes: v })}
      />
      <NoteField
        id="designer-notes"
        label="Designer notes"
        value={fixture.notes}
        editable={data.rights.designerNotes}
        busy={pending}
        onSave={(v) => void save({ notes: v })}
      />
      <div aria-live="polite">{message && <FormMessage message={message.text} tone={message.tone} />}</div>
    </section>
  );
}
