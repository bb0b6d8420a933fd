// The focus call's outbox rules: edits made offline merge per unit against the version they were made on,
// the screen shows them on top of the server's row, and a failed send is retried, settled by the person
// (409) or shown as refused. No outside source: these are Throwline's own rules (common practice for
// optimistic locking, no source).
import { describe, expect, it } from "vitest";
import type { FixtureDto } from "@/lib/dto/fixture";
import {
  classifyFailure,
  conflictRows,
  mergeEdit,
  patchSummary,
  resendAgainst,
  withPending,
} from "@/lib/offline/outbox";
import { ApiError } from "@/lib/http/api-client";

const row = (over: Partial<FixtureDto> = {}): FixtureDto =>
  ({
    id: 7,
    productionId: 3,
    unitNumber: "4",
    positionName: "1st Electric",
    focused: false,
    focusedAt: null,
    focusedBy: null,
    focusNotes: null,
    notes: null,
    goboRotationDeg: null,
    barnDoorTop: null,
    version: 5,
    ...over,
  }) as FixtureDto;

const edit = (patch: Parameters<typeof mergeEdit>[1]["patch"], version = 5) => ({
  productionId: 3,
  fixtureId: 7,
  unitLabel: "unit 4 on 1st Electric",
  version,
  patch,
});

describe("mergeEdit", () => {
  it("starts an entry waiting, against the version the edit was made on", () => {
    const e = mergeEdit(undefined, edit({ focused: true }), new Date("2026-01-02T03:04:05Z"));
    expect(e).toMatchObject({ baseVersion: 5, state: "waiting", queuedAt: "2026-01-02T03:04:05.000Z" });
    expect(e.patch).toEqual({ focused: true });
  });

  it("keeps the first version and lets a later edit of a field replace the earlier one", () => {
    const first = mergeEdit(undefined, edit({ focused: true, focusNotes: "a" }), new Date(0));
    // The screen still shows version 5 from the server; the second edit was made on that same row.
    const second = mergeEdit(first, edit({ focusNotes: "b", barnDoorTop: "in halfway" }, 5), new Date(1000));
    expect(second.baseVersion).toBe(5);
    expect(second.queuedAt).toBe(first.queuedAt);
    expect(second.patch).toEqual({ focused: true, focusNotes: "b", barnDoorTop: "in halfway" });
  });
});

describe("withPending", () => {
  it("shows the waiting edits on top of the server's row and stamps a unit marked on deck", () => {
    const e = mergeEdit(undefined, edit({ focused: true, focusNotes: "shutter off the pros" }), new Date(60_000));
    const shown = withPending(row(), e);
    expect(shown.focused).toBe(true);
    expect(shown.focusNotes).toBe("shutter off the pros");
    expect(shown.focusedAt).toBe(new Date(60_000).toISOString());
    expect(shown.version).toBe(5); // the server's version, never the device's guess
  });

  it("clears the stamp when focused is undone, and leaves a refused entry out", () => {
    const undo = mergeEdit(undefined, edit({ focused: false }), new Date(0));
    const shown = withPending(row({ focused: true, focusedAt: "2026-01-01T00:00:00Z", focusedBy: 2 }), undo);
    expect([shown.focused, shown.focusedAt, shown.focusedBy]).toEqual([false, null, null]);
    const refused = { ...mergeEdit(undefined, edit({ focusNotes: "x" }), new Date(0)), state: "refused" as const };
    expect(withPending(row(), refused).focusNotes).toBeNull();
  });
});

describe("a conflict", () => {
  it("lists each field as theirs and mine, and sending mine again uses their version", () => {
    const e = mergeEdit(undefined, edit({ focused: true, focusNotes: "mine" }), new Date(0));
    const theirs = row({ focusNotes: "theirs", version: 6 });
    const conflicted = { ...e, state: "conflict" as const, theirs };
    expect(conflictRows(conflicted)).toEqual([
      { field: "focused", label: "Focused", mine: "yes", theirs: "no" },
      { field: "focusNotes", label: "As-focused notes", mine: "mine", theirs: "theirs" },
    ]);
    const again = resendAgainst(conflicted, theirs);
    expect(again).toMatchObject({ baseVersion: 6, state: "waiting", theirs: undefined });
    expect(again.patch).toEqual(e.patch);
  });

  it("sorts failures: network retries, 409 is a conflict, 5xx retries, other refusals are final", () => {
    expect(classifyFailure(new TypeError("Failed to fetch"))).toBe("retry");
    expect(classifyFailure(new ApiError(409, "conflict", "Someone else…"))).toBe("conflict");
    expect(classifyFailure(new ApiError(503, "unavailable", "down"))).toBe("retry");
    expect(classifyFailure(new ApiError(403, "forbidden", "no"))).toBe("refused");
    expect(classifyFailure(new ApiError(400, "invalid", "bad"))).toBe("refused");
  });

  it("says what waits in words", () => {
    expect(patchSummary({ focused: true, focusNotes: "x" })).toBe("Marked focused, as-focused notes");
    expect(patchSummary({ barnDoorLeft: "to the leg" })).toBe("Barn door left");
  });
});
