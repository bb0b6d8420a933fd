"use client";
// Deleting units from the rig table, with the plot's undo: the same bounded undo list (lib/plot/undo.ts)
// and the same copy of each unit's fields from the registry (copyOfFixture), so undo hangs them again
// whole. The rig's rows are full fixtures already, so nothing is read before the delete.
import { useCallback, useMemo, useRef, useState } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { apiFetch, ApiError } from "@/lib/http/api-client";
import { UndoStack } from "@/lib/plot/undo";
import { copyOfFixture } from "@/lib/rig/fixture-fields";
import type { FixtureDto } from "@/lib/dto/fixture";
import { productionKeys } from "@/hooks/query-keys";

export type RigDeleteNotice = { tone: "info" | "error"; text: string } | null;

const unitWords = (rows: FixtureDto[]) =>
  rows.length === 1
    ? `unit ${rows[0].unitNumber} on ${rows[0].positionName}${rows[0].cell ? ` (cell ${rows[0].cell})` : ""}`
    : `${rows.length} units`;

export function useRigDelete(productionId: number) {
  const qc = useQueryClient();
  const undo = useRef(new UndoStack(30));
  const [undoLabel, setUndoLabel] = useState<string | null>(null);
  const [notice, setNotice] = useState<RigDeleteNotice>(null);
  const [busy, setBusy] = useState(false);
  const base = `/api/productions/${productionId}`;

  // The plot, the cues' channel list and the checks read the same fixtures.
  const refresh = useCallback(
    () => qc.invalidateQueries({ queryKey: productionKeys.detail(productionId) }),
    [qc, productionId],
  );

  const remove = useCallback(
    async (rows: FixtureDto[]) => {
      if (!rows.length || busy) return;
      setBusy(true);
      const words = unitWords(rows);
      try {
        await apiFetch(`${base}/fixtures`, { method: "DELETE", json: { ids: rows.map((r) => r.id) } });
        qc.setQueryData<FixtureDto[]>(productionKeys.fixtures(productionId), (all) =>
          all?.filter((f) => !rows.some((r) => r.id === f.id)),
        );
        void refresh();
        const copies = rows.map((r) => copyOfFixture(r));
        undo.current.push({
          label: `Delete ${words}`,
          undo: async () => {
            await apiFetch(`${base}/fixtures`, { method: "POST", json: { fixtures: copies } });
            await refresh();
            setNotice({ tone: "info", text: `${words[0].toUpperCase()}${words.slice(1)} hung again.` });
          },
        });
        setUndoLabel(`Delete ${words}`);
        setNotice({ tone: "info", text: `Deleted ${words}.` });
      } catch (err) {
        setNotice({
          tone: "error",
          text: `Could not delete ${words}: ${err instanceof ApiError ? err.message : "the server could not be reached"}. Nothing was changed.`,
        });
        void refresh();
      } finally {
        setBusy(false);
      }
    },
    [base, busy, productionId, qc, refresh],
  );

  const undoLast = useCallback(async () => {
    const entry = undo.current.pop();
    setUndoLabel(undo.current.peek()?.label ?? null);
    if (!entry) return;
    setBusy(true);
    try {
      await entry.undo();
    } catch (err) {
      setNotice({
        tone: "error",
        text: `Could not undo (${entry.label.toLowerCase()}): ${err instanceof ApiError ? err.message : "the server could not be reached"}.`,
      });
    } finally {
      setBusy(false);
    }
  }, []);

  return useMemo(
    () => ({ remove, undoLast, undoLabel, notice, busy, dismiss: () => setNotice(null) }),
    [remove, undoLast, undoLabel, notice, busy],
  );
}
