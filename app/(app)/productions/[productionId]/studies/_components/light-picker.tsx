"use client";

import { useId, useState } from "react";
import type { CueChoice, LightSource } from "./types";

/**
 * "1@80 2@80 12-14@50" → channel levels. Each item is a channel or a range, "@", a level 0–100; the error
 * names the item that could not be read.
 */
export function parseChannelLevels(text: string): { levels: Record<string, number> } | { error: string } {
  const levels: Record<string, number> = {};
  const items = text.split(/[\s,;]+/).filter(Boolean);
  if (!items.length) return { error: "Type channels and levels, e.g. 1@80 2-4@50." };
  for (const item of items) {
    const m = /^(\d{1,5})(?:-(\d{1,5}))?@(\d{1,3}(?:\.\d+)?|full|fl)$/i.exec(item);
    if (!m) return { error: `"${item}" is not channel@level (e.g. 12@80 or 3-6@full).` };
    const from = Number(m[1]);
    const to = m[2] ? Number(m[2]) : from;
    const level = /^f/i.test(m[3]) ? 100 : Number(m[3]);
    if (from < 1 || to < from || to - from > 2000)
      return { error: `"${item}": channels run from 1 upward, low to high.` };
    if (level > 100) return { error: `"${item}": a level is 0 to 100.` };
    for (let ch = from; ch <= to; ch++) levels[String(ch)] = level;
  }
  return { levels };
}

export function LightPicker({
  label,
  cues,
  value,
  onChange,
}: {
  label: string;
  cues: CueChoice[];
  value: LightSource;
  onChange: (s: LightSource) => void;
}) {
  const id = useId();
  const [text, setText] = useState("");
  const [error, setError] = useState<string | null>(null);
  const mode = value.kind === "cue" ? `cue:${value.cueId}` : value.kind;
  return (
    <div className="flex flex-wrap items-end gap-2">
      <label className="flex flex-col text-xs text-muted" htmlFor={id}>
        {label}
        <select
          id={id}
          className="mt-1 rounded-md border border-line bg-surface px-2 py-1.5 text-sm text-ink"
          value={mode}
          onChange={(e) => {
            const v = e.target.value;
            if (v === "full") onChange({ kind: "full" });
            else if (v === "channels") {
              const parsed = parseChannelLevels(text || "1@100");
              if ("levels" in parsed) onChange({ kind: "channels", levels: parsed.levels });
              if (!text) setText("1@100");
            } else onChange({ kind: "cue", cueId: Number(v.slice(4)) });
          }}
        >
          <option value="full">All units at full</option>
          <option value="channels">Chosen channels…</option>
          {cues.map((c) => (
            <option key={c.id} value={`cue:${c.id}`}>
              Cue {c.number}
              {c.label ? ` — ${c.label}` : ""}
            </option>
          ))}
        </select>
      </label>
      {value.kind === "channels" && (
        <label className="flex flex-col text-xs text-muted">
          Channels at levels
          <input
            className="mt-1 w-56 rounded-md border border-line bg-surface px-2 py-1.5 text-sm text-ink"
            value={text}
            aria-describedby={`${id}-err`}
            placeholder="1@80 2-4@50"
            onChange={(e) => setText(e.target.value)}
            onBlur={() => {
              const parsed = parseChannelLevels(text);
              if ("error" in parsed) setError(parsed.error);
              else {
                setError(null);
                onChange({ kind: "channels", levels: parsed.levels });
              }
            }}
          />
          <span id={`${id}-err`} aria-live="polite" className="text-danger">
            {error}
          </span>
        </label>
      )}
    </div>
  );
}
