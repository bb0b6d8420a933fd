"use client";

import { useState } from "react";
import {
  formatCueNumber,
  formatFadeTime,
  formatSplitTime,
  parseCueNumber,
  parseFadeTime,
  parseSplitTime,
  readPartDrafts,
  sameParts,
  toPartDrafts,
  type PartDraft,
} from "@/lib/cues";
import type { CueDto } from "@/lib/dto/cue";
import { useUpdateCue, type CueChanges } from "@/hooks/use-cues";
import { ApiError } from "@/lib/http/api-client";
import { Card } from "@/components/ui/card";
import { TextField } from "@/components/ui/text-field";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";
import { PartsEditor } from "./parts-editor";

type Draft = {
  number: string;
  label: string;
  page: string;
  time: string;
  delay: string;
  downDelay: string;
  follow: string;
  link: string;
  block: boolean;
  callNote: string;
  parts: PartDraft[];
};

function toDraft(c: CueDto): Draft {
  return {
    number: formatCueNumber(c.number),
    label: c.label,
    page: c.page ?? "",
    time: formatSplitTime(c.upTime, c.downTime),
    delay: c.delay ? formatFadeTime(c.delay) : "0",
    downDelay: c.downDelay == null ? "" : formatFadeTime(c.downDelay),
    follow: c.follow == null ? "" : formatFadeTime(c.follow),
    link: c.link == null ? "" : formatCueNumber(c.link),
    block: c.block,
    callNote: c.callNote ?? "",
    parts: toPartDrafts(c.parts),
  };
}

/** Reads the draft into API changes, collecting a readable message per field instead of throwing. */
function readDraft(d: Draft, cue: CueDto): { changes: CueChanges; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  const changes: CueChanges = {};
  const attempt = (field: string, fn: () => void) => {
    try {
      fn();
    } catch (e) {
      errors[field] = (e as Error).message;
    }
  };
  attempt(
    "number",
    () => void (parseCueNumber(d.number) !== cue.number && (changes.number = parseCueNumber(d.number))),
  );
  attempt("time", () => {
    const t = parseSplitTime(d.time);
    if (t.up !== cue.upTime) changes.upTime = t.up;
    if (t.down !== cue.downTime) changes.downTime = t.down;
  });
  attempt(
    "delay",
    () =>
      void (
        parseFadeTime(d.delay || "0", "Wait") !== cue.delay && (changes.delay = parseFadeTime(d.delay || "0", "Wait"))
      ),
  );
  attempt("downDelay", () => {
    // Empty: the down fade waits as long as the up fade.
    const w = d.downDelay.trim() ? parseFadeTime(d.downDelay, "Down wait") : null;
    if (w !== (cue.downDelay ?? null)) changes.downDelay = w;
  });
  attempt("follow", () => {
    const f = d.follow.trim() ? parseFadeTime(d.follow, "Follow") : null;
    if (f !== cue.follow) changes.follow = f;
  });
  attempt("link", () => {
    const l = d.link.trim() ? parseCueNumber(d.link) : null;
    if (l !== cue.link) changes.link = l;
  });
  if (d.label.trim() !== cue.label) changes.label = d.label.trim();
  if ((d.page.trim() || null) !== cue.page) changes.page = d.page.trim() || null;
  if ((d.callNote.trim() || null) !== cue.callNote) changes.callNote = d.callNote.trim() || null;
  if (d.block !== cue.block) changes.block = d.block;
  const parts = readPartDrafts(d.parts);
  Object.assign(errors, parts.errors);
  if (!sameParts(parts.parts, cue.parts)) changes.parts = parts.parts;
  return { changes, errors };
}

/** Server field errors come as lists; the parts editor shows one line each. */
function flat(errors: Record<string, string | string[]>): Record<string, string> {
  return Object.fromEntries(Object.entries(errors).map(([k, v]) => [k, Array.isArray(v) ? v.join(" ") : v]));
}

export function CueForm({ productionId, cue }: { productionId: number; cue: CueDto }) {
  const [draft, setDraft] = useState(() => toDraft(cue));
  const [errors, setErrors] = useState<Record<string, string | string[]>>({});
  const [message, setMessage] = useState<{ tone: "ok" | "error"; text: string } | null>(null);
  const update = useUpdateCue(productionId);
  const set = (k: keyof Draft) => (e: React.ChangeEvent<HTMLInputElement | HTMLTextAreaElement>) =>
    setDraft({ ...draft, [k]: e.target.value });

  async function save(e: React.FormEvent) {
    e.preventDefault();
    const { changes, errors: local } = readDraft(draft, cue);
    setErrors(local);
    if (Object.keys(local).length) return setMessage({ tone: "error", text: "Please check the fields marked." });
    if (!Object.keys(changes).length) return setMessage({ tone: "ok", text: "Nothing changed." });
    try {
      await update.mutateAsync({ id: cue.id, version: cue.version, changes });
      setMessage({ tone: "ok", text: "Saved." });
    } catch (err) {
      if (err instanceof ApiError) {
        setErrors(err.fieldErrors ?? {});
        setMessage({
          tone: "error",
          text: err.status === 409 ? "Someone else saved this cue first; their values are shown now." : err.message,
        });
      } else setMessage({ tone: "error", text: (err as Error).message });
    }
  }

  return (
    <Card title={`Cue ${formatCueNumber(cue.number)}`}>
      <form onSubmit={save} className="grid grid-cols-2 gap-3 sm:grid-cols-4" noValidate>
        <TextField label="Number" name="number" value={draft.number} onChange={set("number")} error={errors.number} />
        <TextField
          label="Label"
          name="label"
          value={draft.label}
          onChange={set("label")}
          error={errors.label}
          className="col-span-1 sm:col-span-3"
        />
        <TextField
          label="Time (up/down)"
          name="time"
          value={draft.time}
          onChange={set("time")}
          error={errors.time ?? errors.upTime ?? errors.downTime}
          hint="5, 5.5, 1:30 or 3/8"
        />
        <TextField label="Wait before" name="delay" value={draft.delay} onChange={set("delay")} error={errors.delay} />
        <TextField
          label="Down fade waits"
          name="downDelay"
          value={draft.downDelay}
          onChange={set("downDelay")}
          error={errors.downDelay}
          hint="empty = as the up fade"
        />
        <TextField
          label="Next cue follows after"
          name="follow"
          value={draft.follow}
          onChange={set("follow")}
          error={errors.follow}
          hint="seconds after GO; empty = called"
        />
        <TextField
          label="Then go to cue"
          name="link"
          value={draft.link}
          onChange={set("link")}
          error={errors.link}
          hint="empty = the next number"
        />
        <TextField label="Page" name="page" value={draft.page} onChange={set("page")} error={errors.page} />
        <label className="col-span-1 flex items-center gap-2 text-sm sm:col-span-3">
          <input
            type="checkbox"
            checked={draft.block}
            onChange={(e) => setDraft({ ...draft, block: e.target.checked })}
            className="size-4"
          />
          <span>Block cue: sets every channel itself, nothing tracks into it (the look stays as it is now)</span>
        </label>
        <PartsEditor
          drafts={draft.parts}
          onChange={(parts) => setDraft({ ...draft, parts })}
          errors={flat(errors)}
          cueTime={draft.time}
        />
        <label className="col-span-2 flex flex-col gap-1 text-sm sm:col-span-4">
          <span className="font-medium">Call note</span>
          <textarea
            name="callNote"
            value={draft.callNote}
            onChange={set("callNote")}
            rows={2}
            className="rounded-md border border-line bg-surface px-3 py-2 text-ink"
          />
        </label>
        <div className="col-span-2 flex items-center gap-3 sm:col-span-4">
          <Button type="submit" disabled={update.isPending}>
            {update.isPending ? "Saving…" : "Save cue"}
          </Button>
          <FormMessage message={message?.text} tone={message?.tone} />
        </div>
      </form>
    </Card>
  );
}
