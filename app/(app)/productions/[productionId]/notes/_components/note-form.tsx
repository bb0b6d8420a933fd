"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { ApiError } from "@/lib/http/api-client";
import {
  NOTE_KINDS,
  NOTE_NEEDS,
  NOTE_PRIORITIES,
  NOTE_SUBJECTS,
  type NoteKind,
  type NoteNeed,
  type NotePriority,
  type NoteSubject,
} from "@/models/note-vocabulary";
import { KIND_LABELS, NEED_LABELS, PRIORITY_LABELS, SUBJECT_LABELS } from "@/lib/notes/words";
import type { NoteSubjects } from "@/lib/notes/subjects";
import { useNoteWrites } from "./use-notes";

export type NotePreset = { subject: NoteSubject; subjectId: number | null; kind?: NoteKind; body?: string };

const field = "rounded border border-line bg-raised px-2 py-1";

/** Writing a note: what it is about, the job, who owns it, what it needs and when it is due. */
export function NoteForm({
  productionId,
  subjects,
  preset,
  onDone,
}: {
  productionId: number;
  subjects: NoteSubjects;
  preset: NotePreset | null;
  onDone?: () => void;
}) {
  const { create } = useNoteWrites(productionId);
  const [subject, setSubject] = useState<NoteSubject>(preset?.subject ?? "production");
  const [subjectId, setSubjectId] = useState<number | null>(preset?.subjectId ?? null);
  const [kind, setKind] = useState<NoteKind>(preset?.kind ?? (preset?.subject === "cue" ? "cue" : "work"));
  const [priority, setPriority] = useState<NotePriority>("normal");
  const [ownerId, setOwnerId] = useState<number | null>(null);
  const [needs, setNeeds] = useState<NoteNeed[]>([]);
  const [dueDate, setDueDate] = useState("");
  const [dueSession, setDueSession] = useState("");
  const [body, setBody] = useState(preset?.body ?? "");
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<string | null>(null);

  const options = subject === "production" ? [] : subjects[subject];
  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    setErrors({});
    setMessage(null);
    try {
      await create.mutateAsync({
        subject,
        subjectId: subject === "production" ? null : subjectId,
        kind,
        priority,
        ownerId,
        needs,
        dueDate: dueDate || null,
        dueSession: dueSession.trim() || null,
        body,
      });
      setBody("");
      setMessage("Note saved.");
      onDone?.();
    } catch (err) {
      if (err instanceof ApiError) setErrors(err.fieldErrors);
      setMessage((err as Error).message);
    }
  };
  const err = (k: string) =>
    errors[k]?.length ? <span className="text-xs text-danger">{errors[k].join("; ")}</span> : null;

  return (
    <form
      onSubmit={submit}
      aria-label="New note"
      className="grid gap-3 rounded-md border border-line bg-surface p-3 text-sm md:grid-cols-4"
    >
      <label className="flex flex-col gap-1">
        About
        <select
          className={field}
          value={subject}
          onChange={(e) => {
            setSubject(e.target.value as NoteSubject);
            setSubjectId(null);
          }}
        >
          {NOTE_SUBJECTS.map((s) => (
            <option key={s} value={s}>
              {SUBJECT_LABELS[s]}
            </option>
          ))}
        </select>
      </label>
      {subject !== "production" ? (
        <label className="flex flex-col gap-1">
          Which {SUBJECT_LABELS[subject].toLowerCase()}
          <select
            className={field}
            value={subjectId ?? ""}
            onChange={(e) => setSubjectId(e.target.value ? Number(e.target.value) : null)}
          >
            <option value="">choose…</option>
            {options.map((o) => (
              <option key={o.id} value={o.id}>
                {o.label}
              </option>
            ))}
          </select>
          {err("subjectId")}
        </label>
      ) : null}
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
          {NOTE_PRIORITIES.map((p) => (
            <option key={p} value={p}>
              {PRIORITY_LABELS[p]}
            </option>
          ))}
        </select>
      </label>
      <label className="flex flex-col gap-1">
        Owner
        <select
          className={field}
          value={ownerId ?? ""}
          onChange={(e) => setOwnerId(e.target.value ? Number(e.target.value) : null)}
        >
          <option value="">nobody yet</option>
          {subjects.people.map((p) => (
            <option key={p.userId} value={p.userId}>
              {p.name}
            </option>
          ))}
        </select>
        {err("ownerId")}
      </label>
      <label className="flex flex-col gap-1">
        Due by (date)
        <input type="date" className={field} value={dueDate} onChange={(e) => setDueDate(e.target.value)} />
        {err("dueDate")}
      </label>
      <label className="flex flex-col gap-1">
        or by (session)
        <input
          className={field}
          value={dueSession}
          maxLength={80}
          placeholder="before the second tech"
          onChange={(e) => setDueSession(e.target.value)}
        />
        {err("dueSession")}
      </label>
      <fieldset className="flex flex-col gap-1 md:col-span-2">
        <legend>Needs</legend>
        <div className="flex flex-wrap gap-3">
          {NOTE_NEEDS.map((n) => (
            <label key={n} className="flex items-center gap-1">
              <input
                type="checkbox"
                checked={needs.includes(n)}
                onChange={(e) => setNeeds(e.target.checked ? [...needs, n] : needs.filter((x) => x !== n))}
              />
              {NEED_LABELS[n]}
            </label>
          ))}
        </div>
      </fieldset>
      <label className="flex flex-col gap-1 md:col-span-4">
        Note
        <textarea
          className={field}
          rows={2}
          maxLength={2000}
          value={body}
          onChange={(e) => setBody(e.target.value)}
          required
        />
        {err("body")}
      </label>
      <div className="flex items-center gap-3 md:col-span-4">
        <Button type="submit" disabled={create.isPending}>
          Add note
        </Button>
        {message ? (
          <span role="status" className={Object.keys(errors).length ? "text-danger" : "text-muted"}>
            {message}
          </span>
        ) : null}
      </div>
      {needs.includes("isolated") || needs.includes("access") ? (
        <p className="text-xs text-caution md:col-span-4">
          Work at height and on isolated power follows the venue&apos;s own procedures and local codes: a qualified
          person isolates and proves dead, and access equipment is used by trained crew only.
        </p>
      ) : null}
    </form>
  );
}
