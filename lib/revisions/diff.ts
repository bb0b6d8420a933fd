// What changed between two snapshots of a production's paperwork, grouped the way a crew reads a
// revision: fixtures added, removed, refocused, re-patched, recoloured; cues added, retimed, re-levelled.
// Pure: it compares two plain objects, so the unit tests build snapshots by hand.
import {
  CUE_SNAPSHOT_FIELDS,
  CUE_TIMING_FIELDS,
  FIXTURE_GROUP_FIELDS,
  FIXTURE_SHOWN_AS,
  FIXTURE_SNAPSHOT_FIELDS,
  cueFieldLabel,
  cueName,
  fixtureFieldLabel,
  fixtureName,
} from "./fields";
import type {
  ChangeLine,
  CueGroups,
  DiffSummary,
  FieldChange,
  FixtureGroups,
  LevelChange,
  RevisionDiff,
  RowGroups,
  SnapCue,
  SnapFixture,
  SnapRow,
  SnapValue,
  Snapshot,
} from "./types";

/** Deep equality of snapshot values; numbers equal within a micro-unit, since they went through decimal columns. */
export function sameValue(a: SnapValue | undefined, b: SnapValue | undefined): boolean {
  if (a === b) return true;
  if (a == null || b == null) return (a ?? null) === (b ?? null);
  if (typeof a === "number" && typeof b === "number") return Math.abs(a - b) < 1e-6;
  if (typeof a !== "object" || typeof b !== "object") return false;
  if (Array.isArray(a) !== Array.isArray(b)) return false;
  if (Array.isArray(a) && Array.isArray(b)) return a.length === b.length && a.every((v, i) => sameValue(v, b[i]));
  const ka = Object.keys(a);
  const kb = Object.keys(b as object);
  if (ka.length !== kb.length) return false;
  const bo = b as Record<string, SnapValue>;
  return ka.every((k) => k in bo && sameValue((a as Record<string, SnapValue>)[k], bo[k]));
}

const byId = <T extends { id: number }>(rows: T[]) => new Map(rows.map((r) => [r.id, r]));

function fixtureChanges(before: SnapFixture, after: SnapFixture): FieldChange[] {
  const out: FieldChange[] = [];
  for (const field of FIXTURE_SNAPSHOT_FIELDS) {
    if (sameValue(before[field], after[field])) continue;
    const shown = FIXTURE_SHOWN_AS[field];
    out.push({
      field,
      label: fixtureFieldLabel(field),
      before: shown ? before[shown] : (before[field] ?? null),
      after: shown ? after[shown] : (after[field] ?? null),
    });
  }
  return out;
}

const GROUPED = new Set<string>(Object.values(FIXTURE_GROUP_FIELDS).flat());

function diffFixtures(a: SnapFixture[], b: SnapFixture[]): FixtureGroups {
  const groups: FixtureGroups = { added: [], removed: [], refocused: [], repatched: [], recoloured: [], otherwise: [] };
  const before = byId(a);
  const after = byId(b);
  for (const f of a) if (!after.has(f.id)) groups.removed.push({ id: f.id, name: fixtureName(f), changes: [] });
  for (const f of b) {
    const old = before.get(f.id);
    if (!old) {
      groups.added.push({ id: f.id, name: fixtureName(f), changes: [] });
      continue;
    }
    const changes = fixtureChanges(old, f);
    if (!changes.length) continue;
    const name = fixtureName(f);
    for (const group of ["refocused", "repatched", "recoloured"] as const) {
      const fields = new Set<string>(FIXTURE_GROUP_FIELDS[group]);
      const mine = changes.filter((c) => fields.has(c.field));
      if (mine.length) groups[group].push({ id: f.id, name, changes: mine });
    }
    const rest = changes.filter((c) => !GROUPED.has(c.field));
    if (rest.length) groups.otherwise.push({ id: f.id, name, changes: rest });
  }
  return groups;
}

/** Channels whose recorded level (the cue's own move) differs; null where the cue records no level. */
export function levelChanges(before: Record<string, number>, after: Record<string, number>): LevelChange[] {
  const channels = new Set([...Object.keys(before), ...Object.keys(after)].map(Number));
  const out: LevelChange[] = [];
  for (const channel of [...channels].sort((x, y) => x - y)) {
    const was = before[channel] ?? null;
    const now = after[channel] ?? null;
    if (!sameValue(was, now)) out.push({ channel, before: was, after: now });
  }
  return out;
}

function diffCues(a: SnapCue[], b: SnapCue[]): CueGroups {
  const groups: CueGroups = { added: [], removed: [], retimed: [], relevelled: [], otherwise: [] };
  const before = byId(a);
  const after = byId(b);
  for (const c of a) if (!after.has(c.id)) groups.removed.push({ id: c.id, name: cueName(c), changes: [] });
  for (const c of b) {
    const old = before.get(c.id);
    const name = cueName(c);
    if (!old) {
      groups.added.push({ id: c.id, name, changes: [] });
      continue;
    }
    const changes: FieldChange[] = CUE_SNAPSHOT_FIELDS.filter((f) => !sameValue(old[f], c[f])).map((f) => ({
      field: f,
      label: cueFieldLabel(f),
      before: old[f] ?? null,
      after: c[f] ?? null,
    }));
    const timing = changes.filter((ch) => CUE_TIMING_FIELDS.has(ch.field));
    const rest = changes.filter((ch) => !CUE_TIMING_FIELDS.has(ch.field));
    if (timing.length) groups.retimed.push({ id: c.id, name, changes: timing });
    const levels = levelChanges(old.levels ?? {}, c.levels ?? {});
    if (levels.length) groups.relevelled.push({ id: c.id, name, changes: [], levels });
    if (rest.length) groups.otherwise.push({ id: c.id, name, changes: rest });
  }
  return groups;
}

const ROW_BOOKKEEPING = new Set(["id", "productionId", "version", "updatedAt", "sortOrder"]);

function diffRows(a: SnapRow[], b: SnapRow[], what: string): RowGroups {
  const groups: RowGroups = { added: [], removed: [], changed: [] };
  const before = byId(a);
  const after = byId(b);
  const line = (r: SnapRow, changes: FieldChange[] = []): ChangeLine => ({
    id: r.id,
    name: `${what} ${r.name}`,
    changes,
  });
  for (const r of a) if (!after.has(r.id)) groups.removed.push(line(r));
  for (const r of b) {
    const old = before.get(r.id);
    if (!old) {
      groups.added.push(line(r));
      continue;
    }
    const fields = new Set([...Object.keys(old), ...Object.keys(r)].filter((k) => !ROW_BOOKKEEPING.has(k)));
    const changes = [...fields]
      .filter((k) => !sameValue(old[k], r[k]))
      .map((k) => ({ field: k, label: k, before: old[k] ?? null, after: r[k] ?? null }));
    if (changes.length) groups.changed.push(line(r, changes));
  }
  return groups;
}

const EMPTY: Snapshot = { format: 1, takenAt: "", fixtures: [], positions: [], types: [], cues: [] };

/** What changed from `from` to `to`; a null `from` (the first revision) lists everything as added. */
export function diffSnapshots(from: Snapshot | null, to: Snapshot): RevisionDiff {
  const a = from ?? EMPTY;
  return {
    fixtures: diffFixtures(a.fixtures, to.fixtures),
    cues: diffCues(a.cues, to.cues),
    positions: diffRows(a.positions, to.positions, "Position"),
    types: diffRows(a.types, to.types, "Type"),
  };
}

const count = <G extends object>(g: G) =>
  Object.fromEntries(Object.entries(g).map(([k, v]) => [k, (v as unknown[]).length])) as Record<keyof G, number>;

export function summarise(diff: RevisionDiff): DiffSummary {
  return {
    fixtures: count(diff.fixtures),
    cues: count(diff.cues),
    positions: count(diff.positions),
    types: count(diff.types),
  };
}

export const isUnchanged = (s: DiffSummary) =>
  [s.fixtures, s.cues, s.positions, s.types].every((g) => Object.values(g).every((n) => n === 0));

/** Ids of every fixture and cue that differs (added or changed; removed ones are gone from the views). */
export function changedIds(diff: RevisionDiff): { fixtureIds: number[]; cueIds: number[] } {
  const ids = (groups: object, skip: string) =>
    [
      ...new Set(
        Object.entries(groups)
          .filter(([k]) => k !== skip)
          .flatMap(([, lines]) => (lines as ChangeLine[]).map((l) => l.id)),
      ),
    ].sort((x, y) => x - y);
  return { fixtureIds: ids(diff.fixtures, "removed"), cueIds: ids(diff.cues, "removed") };
}
