"use client";
// Keyboard: nudges for the selected unit's focus, cone and softness; delete, duplicate, undo, fit.
import { useEffect, type RefObject } from "react";
import { EMPTY_SELECTION, type CanvasHandle, type Selection, type Tool } from "./canvas-types";
import type { Commands } from "./use-commands";
import { deleteFixtures, duplicateFixtures } from "./plot-commands";

const NUDGE_M = 0.05;
const BIG_NUDGE_M = 0.25;

export function usePlotKeys({
  cmd,
  canEdit,
  selection,
  setSelection,
  handle,
  setTool,
}: {
  cmd: Commands;
  canEdit: boolean;
  selection: Selection;
  setSelection: (s: Selection) => void;
  handle: RefObject<CanvasHandle | null>;
  setTool: (t: Tool) => void;
  headHeight: number;
}) {
  useEffect(() => {
    function onKey(e: KeyboardEvent) {
      if ((e.target as HTMLElement)?.closest?.("input, textarea, select")) return;
      const mod = e.ctrlKey || e.metaKey;
      if (e.key === "f" && !mod) return handle.current?.fit();
      if (e.key === "Escape") {
        setTool("select");
        return setSelection(EMPTY_SELECTION);
      }
      if (!canEdit) return;
      if (mod && e.key.toLowerCase() === "z") {
        e.preventDefault();
        return void cmd.undoLast();
      }
      const ids = [...selection.fixtures];
      if (!ids.length) return;
      if (e.key === "Delete" || e.key === "Backspace") {
        e.preventDefault();
        return void deleteFixtures(cmd, ids, () => setSelection(EMPTY_SELECTION));
      }
      if (mod && e.key.toLowerCase() === "d") {
        e.preventDefault();
        return void duplicateFixtures(cmd, ids);
      }
      if (ids.length !== 1) return;
      const id = ids[0];
      const step = e.shiftKey ? BIG_NUDGE_M : NUDGE_M;
      const arrows: Record<string, [number, number]> = {
        ArrowLeft: [-step, 0],
        ArrowRight: [step, 0],
        ArrowUp: [0, step],
        ArrowDown: [0, -step],
      };
      if (arrows[e.key]) {
        e.preventDefault();
        const [dx, dy] = arrows[e.key];
        return void cmd.patchFixture(id, "Nudge the focus", (f) => {
          const m = f.computed.focus;
          return m ? { focusX: r3(m.x + dx), focusY: r3(m.y + dy), focusPointId: null } : null;
        });
      }
      const cone = { "[": -1, "]": 1 }[e.key];
      if (cone)
        return void cmd.patchFixture(id, "Change the cone", (f) => ({
          coneDeg: Math.min(179, Math.max(1, Math.round(f.computed.coneDeg + cone))),
        }));
      const soft = { ",": -0.5, ".": 0.5 }[e.key];
      if (soft)
        return void cmd.patchFixture(id, "Change the softness", (f) => ({
          softnessDeg: Math.max(0, f.computed.softnessDeg + soft),
        }));
      if (e.key === "h")
        return void cmd.patchFixture(id, "Change the aim height", (f) => ({ aim: f.aim === "deck" ? "head" : "deck" }));
    }
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [cmd, canEdit, selection, setSelection, handle, setTool]);
}

const r3 = (n: number) => Math.round(n * 1000) / 1000;
