"use client";
// The focus call's outbox in React: edits go straight to the server when they can, wait on the device when
// they cannot (offline, or the network failed mid-send), and are sent when the network returns, each with the
// version of the row it was made on. A unit someone else changed meanwhile comes back as a conflict for the
// person to settle (theirs, or mine again), never a silent overwrite.
import { useQueryClient } from "@tanstack/react-query";
import { createContext, type ReactNode, useCallback, useContext, useEffect, useMemo, useRef, useState } from "react";
import { productionKeys } from "@/hooks/query-keys";
import { apiFetch } from "@/lib/http/api-client";
import type { FixtureDto, FixtureRecord } from "@/lib/dto/fixture";
import { classifyFailure, type FocusPatch, mergeEdit, type OutboxEntry, resendAgainst } from "./outbox";
import { deleteEntry, outboxAvailable, putEntry, readOutbox } from "./store";

/** How long to wait before trying again while edits wait (whatever the browser says about the network). */
const RETRY_MS = 15_000;
/** The online and offline events are not fired everywhere (some tablets, some emulations): look as well. */
const LOOK_MS = 3_000;

export type SaveOutcome = { kind: "saved"; fixture: FixtureDto } | { kind: "queued" } | { kind: "error"; error: Error };

type Outbox = {
  online: boolean;
  entries: OutboxEntry[];
  byFixture: Map<number, OutboxEntry>;
  /** Saves now, or queues when offline or when this unit already has edits waiting (they go in order). */
  save: (fixture: FixtureDto, patch: FocusPatch) => Promise<SaveOutcome>;
  keepTheirs: (fixtureId: number) => Promise<void>;
  sendMineAgain: (fixtureId: number) => Promise<void>;
  flush: () => Promise<void>;
};

const OutboxContext = createContext<Outbox | null>(null);

export function useOutbox(): Outbox {
  const outbox = useContext(OutboxContext);
  if (!outbox) throw new Error("useOutbox needs an OutboxProvider (the focus call page sets one).");
  return outbox;
}

/** A send that has not answered by then is given up and tried again (venue wifi can hold a request forever). */
const SEND_TIMEOUT_MS = 20_000;

const sendPatch = (productionId: number, fixtureId: number, version: number, patch: FocusPatch) =>
  apiFetch<{ fixture: FixtureDto }>(`/api/productions/${productionId}/fixtures/${fixtureId}`, {
    method: "PATCH",
    json: { version, ...patch },
    signal: AbortSignal.timeout(SEND_TIMEOUT_MS),
  }).then((r) => r.fixture);

function useOnline(): boolean {
  const [online, setOnline] = useState(true);
  useEffect(() => {
    const update = () => setOnline(navigator.onLine);
    update();
    const look = window.setInterval(update, LOOK_MS);
    window.addEventListener("online", update);
    window.addEventListener("offline", update);
    return () => {
      window.clearInterval(look);
      window.removeEventListener("online", update);
      window.removeEventListener("offline", update);
    };
  }, []);
  return online;
}

export function OutboxProvider({ productionId, children }: { productionId: number; children: ReactNode }) {
  const qc = useQueryClient();
  const online = useOnline();
  const [entries, setEntries] = useState<OutboxEntry[]>([]);
  const flushing = useRef(false);
  // Edits of one unit are written one after another (merge, then store) so two quick taps never lose one.
  const chain = useRef<Promise<unknown>>(Promise.resolve());
  const serial = useCallback(<T,>(work: () => Promise<T>): Promise<T> => {
    const next = chain.current.then(work, work);
    chain.current = next.catch(() => undefined);
    return next;
  }, []);

  const reload = useCallback(async () => {
    if (outboxAvailable()) setEntries(await readOutbox(productionId));
  }, [productionId]);
  const takeRow = useCallback(
    (row: FixtureDto) =>
      qc.setQueryData<FixtureDto[]>(productionKeys.fixtures(productionId), (list) =>
        list?.map((f) => (f.id === row.id ? row : f)),
      ),
    [qc, productionId],
  );

  const flush = useCallback(async () => {
    if (flushing.current || !outboxAvailable()) return;
    flushing.current = true;
    try {
      for (const entry of await readOutbox(productionId)) {
        if (entry.state !== "waiting" && entry.state !== "sending") continue;
        try {
          const row = await sendPatch(productionId, entry.fixtureId, entry.baseVersion, entry.patch);
          await serial(async () => {
            // An edit made while this one was on its way stays waiting, now against the row just saved.
            const latest = (await readOutbox(productionId)).find((e) => e.fixtureId === entry.fixtureId);
            if (latest && JSON.stringify(latest.patch) !== JSON.stringify(entry.patch))
              await putEntry({ ...latest, baseVersion: row.version, state: "waiting" });
            else await deleteEntry(productionId, entry.fixtureId);
          });
          takeRow(row);
        } catch (err) {
          const kind = classifyFailure(err);
          if (kind === "retry") break;
          // A 409's row is the stored record only (no position name, no worked-out beam): it serves the
          // conflict's "theirs" and its version; the screen refetches the full rows.
          const current = (err as { current?: FixtureRecord }).current;
          await serial(() =>
            putEntry(
              kind === "conflict"
                ? { ...entry, state: "conflict", theirs: current }
                : { ...entry, state: "refused", message: (err as Error).message },
            ),
          );
          if (current) void qc.invalidateQueries({ queryKey: productionKeys.fixtures(productionId) });
        }
        await reload();
      }
    } finally {
      flushing.current = false;
      await reload();
    }
  }, [productionId, qc, reload, serial, takeRow]);

  const queue = useCallback(
    (fixture: FixtureDto, patch: FocusPatch) =>
      serial(async () => {
        const existing = (await readOutbox(productionId)).find((e) => e.fixtureId === fixture.id);
        const unitLabel = `unit ${fixture.unitNumber} on ${fixture.positionName}`;
        await putEntry(
          mergeEdit(
            existing,
            { productionId, fixtureId: fixture.id, unitLabel, version: fixture.version, patch },
            new Date(),
          ),
        );
        await reload();
      }),
    [productionId, reload, serial],
  );

  const save = useCallback(
    async (fixture: FixtureDto, patch: FocusPatch): Promise<SaveOutcome> => {
      const waiting = entries.some((e) => e.fixtureId === fixture.id);
      if (outboxAvailable() && (!navigator.onLine || waiting)) {
        await queue(fixture, patch);
        if (navigator.onLine) void flush();
        return { kind: "queued" };
      }
      try {
        const row = await sendPatch(productionId, fixture.id, fixture.version, patch);
        takeRow(row);
        return { kind: "saved", fixture: row };
      } catch (err) {
        if (classifyFailure(err) === "retry" && outboxAvailable()) {
          await queue(fixture, patch);
          return { kind: "queued" };
        }
        if (classifyFailure(err) === "conflict")
          void qc.invalidateQueries({ queryKey: productionKeys.fixtures(productionId) });
        return { kind: "error", error: err as Error };
      }
    },
    [entries, flush, productionId, qc, queue, takeRow],
  );

  const keepTheirs = useCallback(
    async (fixtureId: number) => {
      await serial(() => deleteEntry(productionId, fixtureId));
      await reload();
      void qc.invalidateQueries({ queryKey: productionKeys.fixtures(productionId) });
    },
    [productionId, qc, reload, serial],
  );

  const sendMineAgain = useCallback(
    async (fixtureId: number) => {
      const entry = entries.find((e) => e.fixtureId === fixtureId);
      if (!entry?.theirs) return;
      const theirs = entry.theirs;
      await serial(() => putEntry(resendAgainst(entry, theirs)));
      await reload();
      await flush();
    },
    [entries, flush, reload, serial],
  );

  // Load what waited on this device (a reload, a closed tab), then send it whenever the network is back.
  useEffect(() => {
    void reload().then(() => (navigator.onLine ? flush() : undefined));
  }, [reload, flush]);
  useEffect(() => {
    if (!online) return;
    void flush().then(() => qc.invalidateQueries({ queryKey: productionKeys.fixtures(productionId) }));
  }, [online, flush, qc, productionId]);
  const hasWaiting = entries.some((e) => e.state === "waiting" || e.state === "sending");
  useEffect(() => {
    // Tried even when the browser says offline: its guess can be wrong, and a failed try only waits again.
    if (!hasWaiting) return;
    const timer = window.setInterval(() => void flush(), RETRY_MS);
    return () => window.clearInterval(timer);
  }, [hasWaiting, flush]);

  const value = useMemo<Outbox>(
    () => ({
      online,
      entries,
      byFixture: new Map(entries.map((e) => [e.fixtureId, e])),
      save,
      keepTheirs,
      sendMineAgain,
      flush,
    }),
    [online, entries, save, keepTheirs, sendMineAgain, flush],
  );
  return <OutboxContext.Provider value={value}>{children}</OutboxContext.Provider>;
}
