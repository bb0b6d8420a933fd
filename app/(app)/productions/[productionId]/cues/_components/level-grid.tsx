"use client";

import { useMemo } from "react";
import { classifyMoves, formatCueNumber, type MoveKind, type TrackedShow } from "@/lib/cues";
import type { ChannelLabel, CueDto } from "@/lib/data/cues";

const WINDOW = 12;

// Up and down are told apart by an arrow and weight, not by colour alone.
const CELL: Record<MoveKind, string> = {
  up: "font-semibold text-accent",
  down: "font-semibold text-ink underline decoration-dotted",
  held: "font-semibold text-ink",
  tracked: "text-muted",
};
const MARK: Record<MoveKind, string> = { up: "▲", down: "▼", held: "", tracked: "" };

/** Channels down, cues across: every channel's level in the cues around the selected one. */
export function LevelGrid({ show, cues, channels, selectedIndex, onSelect }: { show: TrackedShow; cues: CueDto[]; channels: ChannelLabel[]; selectedIndex: number; onSelect: (id: number) => void }) {
  const first = Math.max(0, Math.min(selectedIndex - Math.floor(WINDOW / 3), cues.length - WINDOW));
  const visible = cues.slice(first, first + WINDOW).map((c, k) => ({ cue: c, index: first + k }));
  const label = useMemo(() => new Map(channels.map((c) => [c.channel, c])), [channels]);
  const moves = useMemo(() => visible.map((v) => classifyMoves(show, v.index)), [show, first, cues.length]); // eslint-disable-line react-hooks/exhaustive-deps
  if (!cues.length) return null;
  return (
    <section aria-labelledby="grid-title" className="rounded-lg border border-line bg-surface">
      <header className="flex items-baseline justify-between px-3 pt-2">
        <h3 id="grid-title" className="text-sm font-semibold uppercase tracking-wide text-muted">Levels</h3>
        <p className="text-xs text-muted">▲ up · ▼ down · bold = recorded in the cue · grey = tracked from before · cues {first + 1}–{first + visible.length} of {cues.length}</p>
      </header>
      <div className="max-h-[28rem] overflow-auto">
        <table className="w-full border-collapse text-xs tabular-nums" aria-label="Levels by channel and cue">
          <thead className="sticky top-0 z-10 bg-raised">
            <tr>
              <th scope="col" className="sticky left-0 bg-raised px-2 py-1 text-left">Ch</th>
              {visible.map(({ cue, index }) => (
                <th key={cue.id} scope="col" className={`px-1 py-1 text-right ${index === selectedIndex ? "bg-accent/20" : ""}`}>
                  <button type="button" onClick={() => onSelect(cue.id)} className="min-h-7 w-full text-right" aria-label={`Select cue ${formatCueNumber(cue.number)}`}>
                    {formatCueNumber(cue.number)}
                    {cue.block ? <span className="ml-0.5 text-[10px] text-muted">B</span> : null}
                  </button>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {show.channels.map((ch, col) => {
              const info = label.get(ch);
              return (
                <tr key={ch} className="border-t border-line/60" data-testid={`grid-ch-${ch}`}>
                  <th scope="row" className="sticky left-0 bg-surface px-2 py-0.5 text-left font-medium" title={[...(info?.purposes ?? []), ...(info?.areas ?? [])].join(" · ")}>
                    {ch}
                  </th>
                  {visible.map(({ cue, index }, k) => {
                    const m = moves[k]?.[col];
                    const level = m?.to ?? 0;
                    const shown = m && (m.kind !== "tracked" || level > 0);
                    return (
                      <td key={cue.id} data-testid={`cell-${ch}-${formatCueNumber(cue.number)}`} className={`px-1 py-0.5 text-right ${index === selectedIndex ? "bg-accent/10" : ""} ${m ? CELL[m.kind] : ""}`}>
                        {shown ? `${MARK[m.kind]}${Math.round(level)}` : ""}
                      </td>
                    );
                  })}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </section>
  );
}
