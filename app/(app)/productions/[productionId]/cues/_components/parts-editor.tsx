"use client";

import { blankPartDraft, type PartDraft } from "@/lib/cues";
import { Button } from "@/components/ui/button";

const cell = "min-h-9 w-full rounded-md border border-line bg-surface px-2 text-ink aria-invalid:border-danger";

function Field({
  draft,
  field,
  label,
  errors,
  onChange,
  mono,
}: {
  draft: PartDraft;
  field: keyof Omit<PartDraft, "key">;
  label: string;
  errors: Record<string, string>;
  onChange: (d: PartDraft) => void;
  mono?: boolean;
}) {
  const id = `part-${draft.key}-${field}`;
  const error = errors[id];
  return (
    <td className="px-1 py-1 align-top">
      <input
        id={id}
        aria-label={`Part ${draft.part || "?"}: ${label}`}
        aria-invalid={Boolean(error) || undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        value={draft[field]}
        onChange={(e) => onChange({ ...draft, [field]: e.target.value })}
        className={`${cell} ${mono ? "font-mono" : ""}`}
      />
      {error ? (
        <span id={`${id}-error`} className="text-xs text-danger">
          {error}
        </span>
      ) : null}
    </td>
  );
}

/** Parts of the cue: each row a number, a label, its own time and wait, and the channels it moves. */
export function PartsEditor({
  drafts,
  onChange,
  errors,
  cueTime,
}: {
  drafts: PartDraft[];
  onChange: (d: PartDraft[]) => void;
  errors: Record<string, string>;
  cueTime: string;
}) {
  const put = (i: number) => (d: PartDraft) => onChange(drafts.map((x, k) => (k === i ? d : x)));
  return (
    <fieldset
      className="col-span-2 flex flex-col gap-2 rounded-md border border-line p-2 sm:col-span-4"
      data-testid="parts-editor"
    >
      <legend className="px-1 text-sm font-medium">Parts</legend>
      <p className="text-xs text-muted">
        Channels in a part fade with the part&apos;s own time and wait; every other channel with the cue&apos;s.
      </p>
      {drafts.length ? (
        <table className="w-full text-sm">
          <thead>
            <tr className="text-left text-xs text-muted">
              <th className="w-14 px-1 font-medium">Part</th>
              <th className="px-1 font-medium">Label</th>
              <th className="w-24 px-1 font-medium">Time (up/down)</th>
              <th className="w-16 px-1 font-medium">Wait</th>
              <th className="px-1 font-medium">Channels</th>
              <th className="w-10" />
            </tr>
          </thead>
          <tbody>
            {drafts.map((d, i) => (
              <tr key={d.key} data-testid={`part-row-${i}`}>
                <Field draft={d} field="part" label="number" errors={errors} onChange={put(i)} />
                <Field draft={d} field="label" label="label" errors={errors} onChange={put(i)} />
                <Field draft={d} field="time" label="time" errors={errors} onChange={put(i)} />
                <Field draft={d} field="delay" label="wait" errors={errors} onChange={put(i)} />
                <Field draft={d} field="channels" label="channels" errors={errors} onChange={put(i)} mono />
                <td className="px-1 py-1 align-top">
                  <button
                    type="button"
                    onClick={() => onChange(drafts.filter((_, k) => k !== i))}
                    aria-label={`Remove part ${d.part}`}
                    className="min-h-9 min-w-9 rounded-md text-muted hover:bg-raised hover:text-danger"
                  >
                    ✕
                  </button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
      {errors.parts ? (
        <p role="alert" className="text-xs text-danger">
          {errors.parts}
        </p>
      ) : null}
      <div>
        <Button
          type="button"
          variant="secondary"
          onClick={() => onChange([...drafts, blankPartDraft(drafts, cueTime)])}
          disabled={drafts.length >= 20}
        >
          Add a part
        </Button>
      </div>
    </fieldset>
  );
}
