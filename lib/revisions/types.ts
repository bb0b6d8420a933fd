// The shapes of a revision: the snapshot of the paperwork it was issued from, and what changed between two
// snapshots. Plain data only (JSON in the revisions table, DTOs for the screens), so client code may import it.
import type { RevisionPurpose } from "@/models/revision-purposes";

export type { RevisionPurpose };

/** A value as a snapshot holds it: what a fixture, cue, position or type field can be. */
export type SnapValue = string | number | boolean | null | SnapValue[] | { [k: string]: SnapValue };

/** A fixture's paperwork fields (the registry's, by model attribute) and the names its ids stand for. */
export type SnapFixture = {
  id: number;
  positionName: string;
  typeName: string;
  focusPointName: string | null;
  /** Kinds of the accessories on the unit (scroller, iris …), for the equipment list. */
  accessories: string[];
  [field: string]: SnapValue;
};

export type SnapCue = {
  id: number;
  number: number;
  label: string;
  levels: Record<string, number>;
  [field: string]: SnapValue;
};

export type SnapRow = { id: number; name: string; [field: string]: SnapValue };

export type Snapshot = {
  /** Format of this snapshot, so an older one can still be read when fields are added. */
  format: 1;
  takenAt: string;
  fixtures: SnapFixture[];
  positions: SnapRow[];
  types: SnapRow[];
  cues: SnapCue[];
};

/** One field's change, with values as a person reads them (names for ids). */
export type FieldChange = { field: string; label: string; before: SnapValue; after: SnapValue };
export type LevelChange = { channel: number; before: number | null; after: number | null };

/** One row in a group of the change list: which thing, and what changed in it for this group. */
export type ChangeLine = { id: number; name: string; changes: FieldChange[]; levels?: LevelChange[] };

export type FixtureGroups = {
  added: ChangeLine[];
  removed: ChangeLine[];
  refocused: ChangeLine[];
  repatched: ChangeLine[];
  recoloured: ChangeLine[];
  /** Moved, re-typed, re-purposed, renumbered, notes: anything else on the paperwork. */
  otherwise: ChangeLine[];
};
export type CueGroups = {
  added: ChangeLine[];
  removed: ChangeLine[];
  retimed: ChangeLine[];
  relevelled: ChangeLine[];
  otherwise: ChangeLine[];
};
export type RowGroups = { added: ChangeLine[]; removed: ChangeLine[]; changed: ChangeLine[] };

export type RevisionDiff = { fixtures: FixtureGroups; cues: CueGroups; positions: RowGroups; types: RowGroups };

/** Counts per group, stored with each revision so the list needs no snapshot. */
export type DiffSummary = {
  fixtures: Record<keyof FixtureGroups, number>;
  cues: Record<keyof CueGroups, number>;
  positions: Record<keyof RowGroups, number>;
  types: Record<keyof RowGroups, number>;
};

/** A revision as the screens and the API see it (no snapshot). */
export type RevisionDto = {
  id: number;
  productionId: number;
  sequence: number;
  label: string;
  issuedFor: RevisionPurpose;
  note: string | null;
  issuedBy: string | null;
  issuedAt: string;
  summary: DiffSummary;
};

/** What the prints carry: the latest issued revision's label, purpose and date. */
export type RevisionStamp = { label: string; issuedFor: RevisionPurpose; issuedAt: string };
