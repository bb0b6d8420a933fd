"use client";

import { Button } from "@/components/ui/button";
import { conflictRows, patchSummary, type OutboxEntry } from "@/lib/offline/outbox";
import { useOutbox } from "@/lib/offline/outbox-context";

function ConflictCard({ entry }: { entry: OutboxEntry }) {
  const { keepTheirs, sendMineAgain } = useOutbox();
  return (
    <li
      className="flex flex-col gap-2 rounded-md border border-danger bg-surface p-3"
      data-testid={`outbox-conflict-${entry.fixtureId}`}
    >
      <p className="text-sm text-ink">
        Someone else changed {entry.unitLabel} before your changes arrived. Nothing of yours was written: choose which
        to keep.
      </p>
      <table className="text-sm">
        <thead>
          <tr className="text-left text-xs text-muted">
            <th scope="col" className="pr-3 font-normal">
              Field
            </th>
            <th scope="col" className="pr-3 font-normal">
              Theirs (saved now)
            </th>
            <th scope="col" className="font-normal">
              Mine (from the deck)
            </th>
          </tr>
        </thead>
        <tbody>
          {conflictRows(entry).map((r) => (
            <tr key={r.field}>
              <th scope="row" className="pr-3 text-left font-medium">
                {r.label}
              </th>
              <td className="whitespace-pre-wrap pr-3">{r.theirs}</td>
              <td className="whitespace-pre-wrap">{r.mine}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <div className="flex flex-wrap gap-2">
        <Button type="button" variant="secondary" className="min-h-12" onClick={() => void keepTheirs(entry.fixtureId)}>
          Keep theirs
        </Button>
        <Button type="button" className="min-h-12" onClick={() => void sendMineAgain(entry.fixtureId)}>
          Send mine again
        </Button>
      </div>
    </li>
  );
}

/**
 * What is waiting on this device: a line while offline, each unit's waiting changes, and any unit that came
 * back as a conflict or was refused. Stays in the page so its live region is heard when things are sent.
 */
export function OutboxPanel() {
  const { online, entries, keepTheirs } = useOutbox();
  const waiting = entries.filter((e) => e.state === "waiting" || e.state === "sending");
  const conflicts = entries.filter((e) => e.state === "conflict");
  const refused = entries.filter((e) => e.state === "refused");
  const status = !online
    ? `Offline: this position's charts are kept on this device. ${waiting.length ? `${waiting.length} ${waiting.length === 1 ? "unit" : "units"} waiting to send.` : "Changes you make will wait here and be sent when the network returns."}`
    : waiting.length
      ? `Sending ${waiting.length} waiting ${waiting.length === 1 ? "unit" : "units"}…`
      : "";
  return (
    <section aria-label="Changes waiting to send" className="flex flex-col gap-2" data-testid="outbox">
      <p
        aria-live="polite"
        data-testid="outbox-status"
        className={status ? "rounded-md border border-line bg-raised px-3 py-2 text-sm text-ink" : "sr-only"}
      >
        {status}
      </p>
      {waiting.length > 0 && (
        <ul className="flex flex-col gap-1 text-sm" data-testid="outbox-waiting">
          {waiting.map((e) => (
            <li key={e.fixtureId} className="text-muted">
              <span className="font-medium text-ink">Waiting to send</span>: {e.unitLabel}: {patchSummary(e.patch)}
            </li>
          ))}
        </ul>
      )}
      {conflicts.length > 0 && (
        <ul className="flex flex-col gap-2" aria-label="Units changed by someone else">
          {conflicts.map((e) => (
            <ConflictCard key={e.fixtureId} entry={e} />
          ))}
        </ul>
      )}
      {refused.map((e) => (
        <div
          key={e.fixtureId}
          className="flex flex-wrap items-center gap-2 rounded-md border border-danger p-3 text-sm"
        >
          <span>
            Not saved: {e.unitLabel}: {e.message}
          </span>
          <Button type="button" variant="secondary" onClick={() => void keepTheirs(e.fixtureId)}>
            Dismiss
          </Button>
        </div>
      ))}
    </section>
  );
}
