"use client";
// Keyboard: nudges for the selected unit's focus, cone and softness; delete, duplicate, undo, fit.
import { useEffect, type RefObject } from "react";
import type { PlotFixture } from "@/lib/plot/slim-fixtures";
import type { CanvasHandle, Selection, Tool } from "./canvas-types";
import { creationFields, type Commands } from "./use-commands";
import { unitNumberForInsert } from "@/lib/plot/along-position";
import { projectOntoPosition } from "@/lib/plot/along-position";

const NUDGE_M = 0.05;
const BIG_NUDGE_M = 0.25;

export function usePlotKeys({ cmd, canEdit, selection, setSelection, handle, setTool }: {
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
        return setSelection({ fixtures: new Set(), positionId: null, focusPointId: null });
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
        return void deleteFixtures(cmd, ids, () => setSelection({ fixtures: new Set(), positionId: null, focusPointId: null }));
      }
      if (mod && e.key.toLowerCase() === "d") {
        e.preventDefault();
        return void duplicateFixtures(cmd, ids);
      }
      if (ids.length !== 1) return;
      const id = ids[0];
      const step = e.shiftKey ? BIG_NUDGE_M : NUDGE_M;
      const arrows: Record<string, [number, number]> = { ArrowLeft: [-step, 0], ArrowRight: [step, 0], ArrowUp: [0, step], ArrowDown: [0, -step] };
      if (arrows[e.key]) {
        e.preventDefault();
        const [dx, dy] = arrows[e.key];
        return void cmd.patchFixture(id, "Nudge the focus", (f) => {
          const m = f.computed.focus;
          return m ? { focusX: r3(m.x + dx), focusY: r3(m.y + dy), focusPointId: null } : null;
        });
      }
      const cone = { "[": -1, "]": 1 }[e.key];
      if (cone) return void cmd.patchFixture(id, "Change the cone", (f) => ({ coneDeg: Math.min(179, Math.max(1, Math.round(f.computed.coneDeg + cone))) }));
      const soft = { ",": -0.5, ".": 0.5 }[e.key];
      if (soft) return void cmd.patchFixture(id, "Change the softness", (f) => ({ softnessDeg: Math.max(0, f.computed.softnessDeg + soft) }));
      if (e.key === "h") return void cmd.patchFixture(id, "Change the aim height", (f) => ({ aim: f.aim === "deck" ? "head" : "deck" }));
    }
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [cmd, canEdit, selection, setSelection, handle, setTool]);
}

const r3 = (n: number) => Math.round(n * 1000) / 1000;

export function deleteFixtures(cmd: Commands, ids: number[], done: () => void) {
  const rows = ids.map((id) => cmd.fixture(id)).filter((f): f is PlotFixture => f !== null);
  return cmd.run(`Delete ${rows.length} unit${rows.length === 1 ? "" : "s"}`, async () => {
    const full = await cmd.actions.fullFixtures(rows.map((f) => f.id)); // kept whole for undo
    await cmd.actions.deleteFixtures(rows.map((f) => f.id));
    done();
    cmd.remember(`Delete ${rows.length} unit${rows.length === 1 ? "" : "s"}`, () =>
      cmd.run("Undo delete", () => cmd.actions.createFixtures(full.map(creationFields))).then(() => undefined),
    );
  });
}

/** Copies sit a little along their position, with unit numbers slotted in after the originals. */
export function duplicateFixtures(cmd: Commands, ids: number[]) {
  const data = cmd.latest();
  const known = ids.filter((id) => cmd.fixture(id) !== null);
  if (!known.length) return;
  return cmd.run("Duplicate", async () => {
    const full = new Map((await cmd.actions.fullFixtures(known)).map((f) => [f.id, f]));
    const taken = new Map<number, string[]>();
    const copies = known.flatMap((id) => {
      const f = full.get(id);
      const pos = f && data.positions.find((p) => p.id === f.positionId);
      if (!f || !pos) return [];
      const list = taken.get(pos.id) ?? data.fixtures.filter((x) => x.positionId === pos.id).map((x) => x.unitNumber);
      const unitNumber = unitNumberForInsert(list, f.unitNumber);
      taken.set(pos.id, [...list, unitNumber]);
      const at = projectOntoPosition(pos, { x: f.x + 0.3 * Math.sign(f.x || 1), y: f.y }).point;
      return [{ ...creationFields(f), unitNumber, x: at.x, y: at.y, channel: null }];
    });
    if (!copies.length) return;
    const created = await cmd.actions.createFixtures(copies);
    cmd.remember(`Duplicate ${created.length}`, () => cmd.run("Undo duplicate", () => cmd.actions.deleteFixtures(created.map((c) => c.id))).then(() => undefined));
  });
}
