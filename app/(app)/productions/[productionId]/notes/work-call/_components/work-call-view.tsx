"use client";

import { useState } from "react";
import Link from "next/link";
import { Button } from "@/components/ui/button";
import { ApiError } from "@/lib/http/api-client";
import { formatLength } from "@/lib/optics";
import type { WorkCallStop } from "@/lib/notes/work-call";
import { NEED_LABELS, PRIORITY_LABELS, STATUS_LABELS } from "@/lib/notes/words";
import { personName } from "@/lib/notes/subjects";
import { useNoteWrites, useWorkCall } from "../../_components/use-notes";

/** The open work notes in walking order, grouped by position; printable; Done records who and when. */
export function WorkCallView({
  productionId,
  productionName,
  displayUnits,
  initial,
  people,
  canClose,
}: {
  productionId: number;
  productionName: string;
  displayUnits: "metric" | "imperial";
  initial: WorkCallStop[];
  people: Array<{ userId: number; name: string }>;
  canClose: boolean;
}) {
  const { data: stops } = useWorkCall(productionId, initial);
  const { update } = useNoteWrites(productionId);
  const [message, setMessage] = useState<string | null>(null);
  const done = async (s: WorkCallStop) => {
    setMessage(null);
    try {
      await update.mutateAsync({ id: s.note.id, version: s.note.version, changes: { status: "done" } });
      setMessage(`Done: ${s.note.body}`);
    } catch (e) {
      setMessage(
        e instanceof ApiError && e.status === 409
          ? "Someone else changed that note first; the list is refreshed."
          : (e as Error).message,
      );
    }
  };
  const groups: Array<{ key: string; title: string; stops: WorkCallStop[] }> = [];
  for (const s of stops) {
    const key = s.position ? `p${s.position.id}` : "off";
    const last = groups.at(-1);
    if (last?.key === key) last.stops.push(s);
    else
      groups.push({
        key,
        title: s.position
          ? `${s.position.name}${s.height != null ? ` · ${formatLength(s.height, displayUnits)} up` : ""}`
          : "Not on the rig",
        stops: [s],
      });
  }
  const needsAccess = stops.some((s) => s.note.needs.includes("access") || s.note.needs.includes("isolated"));
  return (
    <main className="mx-auto flex max-w-5xl flex-col gap-3 p-4 print:p-0">
      <div className="no-print flex flex-wrap items-center justify-between gap-2">
        <Link href={`/productions/${productionId}/notes`} className="text-sm underline">
          All notes
        </Link>
        <Button variant="secondary" onClick={() => window.print()}>
          Print
        </Button>
      </div>
      <h2 className="text-base font-semibold">
        Work call · {productionName} · {stops.length} open job{stops.length === 1 ? "" : "s"}
      </h2>
      <p className="text-sm text-muted print:text-black">
        Highest positions first, one pass along each; jobs off the rig at the end.
      </p>
      {needsAccess ? (
        <p className="text-sm text-caution print:text-black">
          Some jobs need a lift, ladder or isolated power: follow the venue&apos;s procedures and local codes, with
          trained, qualified people; isolate and prove dead before opening a unit.
        </p>
      ) : null}
      {message ? (
        <p role="status" className="no-print text-sm">
          {message}
        </p>
      ) : null}
      {groups.length === 0 ? <p className="text-sm text-muted">No open work notes.</p> : null}
      <ol className="flex flex-col gap-4" data-testid="work-call">
        {groups.map((g) => (
          <li key={g.key} className="break-inside-avoid">
            <h3 className="border-b border-line font-medium">{g.title}</h3>
            <ol className="flex flex-col">
              {g.stops.map((s) => (
                <li
                  key={s.note.id}
                  className="flex flex-wrap items-start gap-3 border-b border-line py-2 text-sm"
                  data-testid={`work-call-note-${s.note.id}`}
                >
                  <span aria-hidden className="hidden h-4 w-4 border border-black print:inline-block" />
                  <span className="min-w-24 font-medium">
                    {s.fixture
                      ? `Unit ${s.fixture.unitNumber}${s.fixture.channel != null ? ` (ch ${s.fixture.channel})` : ""}`
                      : s.position
                        ? "Whole position"
                        : ""}
                  </span>
                  <span className="flex-1">
                    {s.note.body}
                    <span className="block text-xs text-muted print:text-black">
                      {[
                        PRIORITY_LABELS[s.note.priority] + " priority",
                        STATUS_LABELS[s.note.status],
                        s.note.ownerId != null ? `owner ${personName(s.note.ownerId, { people })}` : "",
                        ...s.note.needs.map((n) => NEED_LABELS[n]),
                        s.note.dueDate ?? "",
                        s.note.dueSession ?? "",
                      ]
                        .filter(Boolean)
                        .join(" · ")}
                    </span>
                  </span>
                  {canClose ? (
                    <Button
                      className="no-print"
                      variant="secondary"
                      disabled={update.isPending}
                      onClick={() => done(s)}
                      aria-label={`Mark done: ${s.note.body}`}
                    >
                      Done
                    </Button>
                  ) : null}
                </li>
              ))}
            </ol>
          </li>
        ))}
      </ol>
    </main>
  );
}
