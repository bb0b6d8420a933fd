"use client";

import { useMemo } from "react";
import { classifyMoves, type TrackedShow } from "@/lib/cues";
import type { ChannelLabel } from "@/lib/dto/cue";
import { Card } from "@/components/ui/card";
import { TapHint } from "@/components/ui/tap-hint";

function Group({
  title,
  items,
  describe,
  testId,
}: {
  title: string;
  items: Array<{ channel: number; from: number; to: number }>;
  describe: (ch: number) => string;
  testId: string;
}) {
  return (
    <div data-testid={testId}>
      <h3 className="text-xs font-semibold uppercase tracking-wide text-muted">
        {title} ({items.length})
      </h3>
      {items.length ? (
        <ul className="mt-1 flex flex-wrap gap-1 text-xs">
          {items.slice(0, 60).map((m) => (
            <li key={m.channel} className="rounded border border-line px-1.5 py-0.5 tabular-nums">
              {describe(m.channel) ? (
                <TapHint hint={describe(m.channel)}>
                  {m.channel}: {Math.round(m.from)}→{Math.round(m.to)}
                </TapHint>
              ) : (
                <>
                  {m.channel}: {Math.round(m.from)}→{Math.round(m.to)}
                </>
              )}
            </li>
          ))}
          {items.length > 60 ? <li className="text-muted">+{items.length - 60} more</li> : null}
        </ul>
      ) : (
        <p className="text-xs text-muted">none</p>
      )}
    </div>
  );
}

/** Which channels go up, go down, or carry their level on (tracked) in the selected cue. */
export function ChannelMoves({
  show,
  index,
  channels,
}: {
  show: TrackedShow;
  index: number;
  channels: ChannelLabel[];
}) {
  const moves = useMemo(() => classifyMoves(show, index), [show, index]);
  const info = useMemo(() => new Map(channels.map((c) => [c.channel, c])), [channels]);
  const describe = (ch: number) => {
    const i = info.get(ch);
    return i ? [...i.areas, ...i.purposes].join(" · ") : "no fixture on this channel";
  };
  const up = moves.filter((m) => m.kind === "up");
  const down = moves.filter((m) => m.kind === "down");
  const tracked = moves.filter((m) => (m.kind === "tracked" || m.kind === "held") && m.to > 0);
  return (
    <Card title="What moves in this cue">
      <div className="flex flex-col gap-3">
        <Group title="Up" items={up} describe={describe} testId="moves-up" />
        <Group title="Down" items={down} describe={describe} testId="moves-down" />
        <Group title="Staying (tracked or held)" items={tracked} describe={describe} testId="moves-tracked" />
      </div>
    </Card>
  );
}
