"use client";
// Saving from the plot: one write at a time (so quick nudges never race their own versions), an undo
// list for the session, and plain messages — a 409 shows the other person's change and offers to
// apply ours again on top of it.
import { useCallback, useMemo, useRef, useState } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { ApiError } from "@/lib/http/api-client";
import { UndoStack } from "@/lib/plot/undo";
import { productionKeys } from "@/hooks/query-keys";
import { usePlotActions } from "@/hooks/use-plot-actions";
import type { PlotPayload } from "@/hooks/use-plot";
import type { FixtureDto } from "@/lib/dto/fixture";
import type { PlotFixture } from "@/lib/plot/slim-fixtures";
import { copyOfFixture } from "@/lib/rig/fixture-fields";

export type Notice = { tone: "info" | "error" | "conflict"; text: string; retry?: () => void } | null;

/** The fields needed to hang a copy of a fixture (what undo of a delete and duplicate send): the registry's. */
export const creationFields = (f: FixtureDto): Record<string, unknown> => copyOfFixture(f);

export function useCommands(productionId: number) {
  const qc = useQueryClient();
  const actions = usePlotActions(productionId);
  const undo = useRef(new UndoStack(30));
  const queue = useRef<Promise<unknown>>(Promise.resolve());
  const [notice, setNotice] = useState<Notice>(null);
  const [undoLabel, setUndoLabel] = useState<string | null>(null);
  const [busy, setBusy] = useState(0);

  const latest = useCallback(
    () => qc.getQueryData<PlotPayload>(productionKeys.plot(productionId))!,
    [qc, productionId],
  );
  const fixture = useCallback((id: number) => latest().fixtures.find((f) => f.id === id) ?? null, [latest]);

  const run = useCallback(
    <T>(label: string, work: () => Promise<T>, retry?: () => void): Promise<T | undefined> => {
      setBusy((n) => n + 1);
      const next = queue.current.then(async () => {
        try {
          const result = await work();
          setNotice(null);
          return result;
        } catch (err) {
          if (err instanceof ApiError && err.status === 409) {
            await actions.refresh();
            setNotice({
              tone: "conflict",
              text: `Someone else changed this first (${label.toLowerCase()}). Their version is shown now; yours was not saved.`,
              retry,
            });
          } else if (err instanceof ApiError) {
            const fields = Object.entries(err.fieldErrors ?? {})
              .map(([k, v]) => `${k}: ${v[0]}`)
              .join("; ");
            setNotice({
              tone: "error",
              text: `${label}: ${err.message}${fields && !err.message.includes(fields) ? ` (${fields})` : ""}`,
            });
          } else setNotice({ tone: "error", text: `${label}: the server could not be reached. Nothing was changed.` });
          return undefined;
        } finally {
          setBusy((n) => n - 1);
        }
      });
      queue.current = next;
      return next;
    },
    [actions],
  );

  const remember = useCallback((label: string, fn: () => Promise<void>) => {
    undo.current.push({ label, undo: fn });
    setUndoLabel(label);
  }, []);

  return useMemo(() => {
    /** Patches a fixture with its latest version; `patchFor` may read the latest row (for nudges). */
    function patchFixture(
      id: number,
      label: string,
      patchFor: (f: PlotFixture) => Record<string, unknown> | null,
      opts: { undoable?: boolean } = {},
    ) {
      const attempt = () =>
        run(
          label,
          async () => {
            const f = fixture(id);
            if (!f) return;
            const patch = patchFor(f);
            if (!patch) return;
            const before = Object.fromEntries(Object.keys(patch).map((k) => [k, f[k as keyof PlotFixture] ?? null]));
            await actions.patchFixture(id, { ...patch, version: f.version });
            if (opts.undoable !== false)
              remember(label, () =>
                run(`Undo ${label.toLowerCase()}`, async () => {
                  const now = fixture(id);
                  if (now) await actions.patchFixture(id, { ...before, version: now.version });
                }).then(() => undefined),
              );
          },
          () => void attempt(),
        );
      return attempt();
    }
    return {
      notice,
      setNotice,
      busy: busy > 0,
      undoLabel,
      actions,
      latest,
      fixture,
      run,
      remember,
      patchFixture,
      async undoLast() {
        const entry = undo.current.pop();
        setUndoLabel(undo.current.peek()?.label ?? null);
        if (entry) await entry.undo();
      },
    };
  }, [notice, busy, undoLabel, actions, latest, fixture, run, remember]);
}

export type Commands = ReturnType<typeof useCommands>;
