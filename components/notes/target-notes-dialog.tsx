"use client";
// One thing's notes in a modal dialog: what is still to do on it, a quick note with the thing filled in,
// and a way into the Notes tab filtered to it (where notes are moved along and closed).
import { useEffect, useRef, useState } from "react";
import { createPortal } from "react-dom";
import Link from "next/link";
import { Button } from "@/components/ui/button";
import { useAddNote, useProductionNotes } from "@/hooks/use-note-counts";
import { ApiError } from "@/lib/http/api-client";
import { KIND_LABELS, PRIORITY_LABELS, STATUS_LABELS } from "@/lib/notes/words";
import { CLOSED_STATUSES, NOTE_KINDS, type NoteKind, type NotePriority } from "@/models/note-vocabulary";
import type { NoteTarget } from "./note-target";

const field = "rounded border border-line bg-raised px-2 py-1";

export function TargetNotesDialog({
  productionId,
  target,
  defaultKind,
  onClose,
  presetBody = "",
}: {
  productionId: number;
  target: NoteTarget;
  defaultKind: NoteKind;
  onClose: () => void;
  presetBody?: string;
}) {
  const dialog = useRef<HTMLDialogElement>(null);
  const notes = useProductionNotes(productionId, true);
  const add = useAddNote(productionId);
  const [body, setBody] = useState(presetBody);
  const [kind, setKind] = useState<NoteKind>(defaultKind);
  const [priority, setPriority] = useState<NotePriority>("normal");
  const [message, setMessage] = useState<{ text: string; error: boolean } | null>(null);

  useEffect(() => {
    const d = dialog.current;
    // Modal: focus moves in, Escape closes, the page behind is inert. No close() on cleanup: unmounting
    // ends the modal state, and a close event there would shut the panel on React's double effect run.
    if (d && !d.open) d.showModal();
  }, []);

  const mine = (notes.data ?? []).filter((n) => n.subject === target.subject && n.subjectId === target.subjectId);
  const unfinished = mine.filter((n) => !CLOSED_STATUSES.includes(n.status));
  const titleId = `notes-dialog-${target.subject}-${target.subjectId}`;

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    setMessage(null);
    try {
      await add.mutateAsync({ subject: target.subject, subjectId: target.subjectId, body, kind, priority });
      setBody("");
      setMessage({ text: `Note added on ${target.label}.`, error: false });
    } catch (err) {
      const fields = err instanceof ApiError ? Object.values(err.fieldErrors).flat() : [];
      setMessage({ text: [(err as Error).message, ...fields].join(" "), error: true });
    }
  }

  // In the page's body, so a table cell's styles (no wrapping, sticky columns) don't reach the panel. React
  // still bubbles its events to the opener's ancestors: the dialog stops clicks and keys from reaching them.
  return createPortal(
    <dialog
      ref={dialog}
      aria-labelledby={titleId}
      onClose={onClose}
      onClick={(e) => e.stopPropagation()}
      onKeyDown={(e) => e.stopPropagation()}
      data-testid="notes-dialog"
      className="m-auto w-[min(36rem,calc(100vw-2rem))] rounded-md border border-line bg-surface p-4 text-sm text-ink backdrop:bg-black/40"
    >
      <div className="flex items-start justify-between gap-3">
        <h2 id={titleId} className="text-base font-semibold">
          Notes on {target.label}
        </h2>
        <Button type="button" variant="quiet" onClick={() => dialog.current?.close()} aria-label="Close the notes">
          ✕
        </Button>
      </div>
      {notes.isPending ? <p className="text-muted">Reading the notes…</p> : null}
      {notes.isError ? (
        <p role="alert" className="text-danger">
          {(notes.error as Error).message}
        </p>
      ) : null}
      {notes.data ? (
        unfinished.length ? (
          <ul className="mt-2 flex max-h-60 flex-col gap-2 overflow-y-auto" aria-label="Open notes">
            {unfinished.map((n) => (
              <li key={n.id} className="rounded border border-line p-2" data-testid={`dialog-note-${n.id}`}>
                <p className="whitespace-pre-wrap">{n.body}</p>
                <p className="mt-1 text-xs text-muted">
                  {KIND_LABELS[n.kind]} · {STATUS_LABELS[n.status]}
                  {n.priority !== "normal" ? ` · ${PRIORITY_LABELS[n.priority]} priority` : ""}
                  {n.runningCueNumber ? ` · written in cue ${n.runningCueNumber}` : ""}
                </p>
              </li>
            ))}
          </ul>
        ) : (
          <p className="mt-2 text-muted">
            No open notes on {target.label}
            {mine.length ? ` (${mine.length} finished)` : ""}.
          </p>
        )
      ) : null}
      <form onSubmit={submit} className="mt-3 flex flex-col gap-2" aria-label={`Add a note on ${target.label}`}>
        <label className="flex flex-col gap-1">
          New note
          <textarea
            className={field}
            rows={3}
            maxLength={2000}
            required
            value={body}
            onChange={(e) => setBody(e.target.value)}
          />
        </label>
        <div className="flex flex-wrap items-end gap-3">
          <label className="flex flex-col gap-1">
            Kind
            <select className={field} value={kind} onChange={(e) => setKind(e.target.value as NoteKind)}>
              {NOTE_KINDS.map((k) => (
                <option key={k} value={k}>
                  {KIND_LABELS[k]}
                </option>
              ))}
            </select>
          </label>
          <label className="flex flex-col gap-1">
            Priority
            <select className={field} value={priority} onChange={(e) => setPriority(e.target.value as NotePriority)}>
              {(["low", "normal", "high"] as const).map((p) => (
                <option key={p} value={p}>
                  {PRIORITY_LABELS[p]}
                </option>
              ))}
            </select>
          </label>
          <Button type="submit" disabled={add.isPending || !body.trim()}>
            Add note
          </Button>
        </div>
        {message ? (
          <p role={message.error ? "alert" : "status"} className={message.error ? "text-danger" : ""}>
            {message.text}
          </p>
        ) : null}
      </form>
      <Link
        className="mt-3 inline-block underline"
        href={`/productions/${productionId}/notes?subject=${target.subject}&subjectId=${target.subjectId}`}
      >
        All notes on {target.label} in the Notes tab
      </Link>
    </dialog>,
    document.body,
  );
}
