"use client";

import { useEffect, useMemo, useRef, useState } from "react";
import { formatCueNumber, type MoveKind, type TrackedShow } from "@/lib/cues";
import type { ChannelLabel, CueDto } from "@/lib/dto/cue";
import { TapHint } from "@/components/ui/tap-hint";
import { useVirtualRows } from "./use-virtual-rows";

const ROW = 24; // px; every row the same height so the grid can render only the rows in view
const CH_COLUMN = 56; // px: the channel numbers down the left
const CUE_COLUMN = 52; // px a cue column needs for "▲100" and a number such as 12.5 (measured at text-xs)
const MIN_CUES = 8;

/** As many cue columns as the grid's width holds (at least 8), so a wide window shows more of the list. */
function useCueColumns(): [React.RefObject<HTMLElement | null>, number] {
  const ref = useRef<HTMLElement>(null);
  const [count, setCount] = useState(12);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const measure = () =>
      setCount(Math.max(MIN_CUES, Math.floor((el.clientWidth - CH_COLUMN) / CUE_COLUMN) || MIN_CUES));
    measure();
    const ro = new ResizeObserver(measure);
    ro.observe(el);
    return () => ro.disconnect();
  }, []);
  return [ref, count];
}

// Up and down are told apart by an arrow and weight, not by colour alone.
const CELL: Record<MoveKind, string> = {
  up: "font-semibold text-accent",
  down: "font-semibold text-ink underline decoration-dotted",
  held: "font-semibold text-ink",
  tracked: "text-muted",
};
const MARK: Record<MoveKind, string> = { up: "▲", down: "▼", held: "", tracked: "" };

/** What a channel (column `col`) does in the cue at `index`, read straight from the tracked show. */
function cellAt(show: TrackedShow, index: number, col: number): { level: number; kind: MoveKind } {
  const level = show.states[index][col];
  const from = index > 0 ? show.states[index - 1][col] : 0;
  const kind: MoveKind = level > from ? "up" : level < from ? "down" : show.recorded[index][col] ? "held" : "tracked";
  return { level, kind };
}

type Props = {
  show: TrackedShow;
  cues: CueDto[];
  channels: ChannelLabel[];
  selectedIndex: number;
  onSelect: (id: number) => void;
  focusChannel: { channel: number } | null;
  /** A role that may not write levels reads the same grid, said plainly. */
  readOnly?: boolean;
};

/**
 * Channels down, cues across: every channel's level in the cues around the selected one. Only rows in
 * view are drawn; the grid is as tall as the window leaves room for and as wide as its column allows.
 */
export function LevelGrid({ show, cues, channels, selectedIndex, onSelect, focusChannel, readOnly }: Props) {
  const [sectionRef, WINDOW] = useCueColumns();
  const first = Math.max(0, Math.min(selectedIndex - Math.floor(WINDOW / 3), cues.length - WINDOW));
  const visible = cues.slice(first, first + WINDOW).map((c, k) => ({ cue: c, index: first + k }));
  const label = useMemo(() => new Map(channels.map((c) => [c.channel, c])), [channels]);
  const rows = useVirtualRows({ count: show.channels.length, rowHeight: ROW });
  const [jump, setJump] = useState("");
  const [jumpError, setJumpError] = useState<string | null>(null);
  const { scrollToIndex } = rows;

  // After a typed line, the first channel it touched comes into view.
  // biome-ignore lint/correctness/useExhaustiveDependencies: only when a line was typed, not on every change of the show
  useEffect(() => {
    if (focusChannel) scrollToIndex(show.column.get(focusChannel.channel) ?? -1);
  }, [focusChannel, scrollToIndex]);

  if (!cues.length) return null;
  const goTo = (e: React.FormEvent) => {
    e.preventDefault();
    const ch = Number(jump.trim());
    const col = show.column.get(ch);
    if (col === undefined) return setJumpError(`Channel ${jump.trim() || "?"} is not in the rig or the cues`);
    setJumpError(null);
    scrollToIndex(col);
  };

  return (
    <section
      ref={sectionRef}
      aria-labelledby="grid-title"
      className="rounded-lg border border-line bg-surface"
      data-testid="level-grid"
    >
      <header className="flex flex-wrap items-center justify-between gap-2 px-3 pt-2">
        <h3 id="grid-title" className="text-sm font-semibold uppercase tracking-wide text-muted">
          Levels{readOnly ? " (read only)" : ""}
        </h3>
        <form onSubmit={goTo} className="flex items-center gap-1 text-xs">
          <label htmlFor="grid-jump" className="text-muted">
            Go to channel
          </label>
          <input
            id="grid-jump"
            value={jump}
            onChange={(e) => setJump(e.target.value)}
            inputMode="numeric"
            className="min-h-8 w-16 rounded border border-line bg-canvas px-1.5"
            aria-describedby="grid-jump-error"
          />
          <span id="grid-jump-error" role="alert" className="text-danger">
            {jumpError}
          </span>
        </form>
      </header>
      <p className="px-3 text-xs text-muted">
        ▲ up · ▼ down · bold = recorded in the cue · grey = tracked from before · cues {first + 1}–
        {first + visible.length} of {cues.length} · {show.channels.length} channels
        {readOnly ? " · levels are written by the designer; choose a cue to move the window" : ""}
      </p>
      <div
        ref={rows.ref}
        onScroll={rows.onScroll}
        // The window's height less the tabs above and the grid's own header: the whole grid in view once scrolled to.
        className="max-h-[calc(100dvh-7rem)] min-h-64 overflow-auto"
        data-testid="level-grid-scroll"
      >
        <table
          className="w-full border-collapse text-xs tabular-nums"
          aria-label="Levels by channel and cue"
          aria-rowcount={show.channels.length + 1}
        >
          <thead className="sticky top-0 z-10 bg-raised">
            <tr style={{ height: ROW }}>
              <th scope="col" className="sticky left-0 bg-raised px-2 text-left">
                Ch
              </th>
              {visible.map(({ cue, index }) => (
                <th
                  key={cue.id}
                  scope="col"
                  className={`px-1 text-right ${index === selectedIndex ? "bg-accent/20" : ""}`}
                >
                  {/* Named by what it shows plus words for a screen reader ("Select cue 1.5, block"). */}
                  <button type="button" onClick={() => onSelect(cue.id)} className="h-6 w-full text-right">
                    <span className="sr-only">Select cue </span>
                    {formatCueNumber(cue.number)}
                    {cue.block ? (
                      <>
                        <span className="sr-only">, block</span>
                        <span aria-hidden="true" className="ml-0.5 text-[10px] text-muted">
                          B
                        </span>
                      </>
                    ) : null}
                  </button>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.padTop ? <tr aria-hidden style={{ height: rows.padTop }} /> : null}
            {show.channels.slice(rows.first, rows.last).map((ch, k) => {
              const col = rows.first + k;
              const info = label.get(ch);
              const purposes = [...(info?.purposes ?? []), ...(info?.areas ?? [])].join(" · ");
              return (
                <tr
                  key={ch}
                  style={{ height: ROW }}
                  aria-rowindex={col + 2}
                  className="border-t border-line/60"
                  data-testid={`grid-ch-${ch}`}
                >
                  <th scope="row" className="sticky left-0 bg-surface px-2 text-left font-medium">
                    {purposes ? (
                      <TapHint hint={purposes} compact testId={`grid-ch-hint-${ch}`}>
                        {ch}
                      </TapHint>
                    ) : (
                      ch
                    )}
                  </th>
                  {visible.map(({ cue, index }) => {
                    const m = cellAt(show, index, col);
                    const shown = m.kind !== "tracked" || m.level > 0;
                    return (
                      <td
                        key={cue.id}
                        data-testid={`cell-${ch}-${formatCueNumber(cue.number)}`}
                        className={`px-1 text-right ${index === selectedIndex ? "bg-accent/10" : ""} ${CELL[m.kind]}`}
                      >
                        {shown ? `${MARK[m.kind]}${Math.round(m.level)}` : ""}
                      </td>
                    );
                  })}
                </tr>
              );
            })}
            {rows.padBottom ? <tr aria-hidden style={{ height: rows.padBottom }} /> : null}
          </tbody>
        </table>
      </div>
    </section>
  );
}
