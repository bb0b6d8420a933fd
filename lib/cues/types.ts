/**
 * A part: a group of channels inside one cue that fades with its own times. Channels of the cue
 * that are in no part fade with the cue's own times. Part numbers run 1–20 within a cue.
 */
export type CuePart = {
  part: number;
  label: string;
  upTime: number;
  downTime: number | null;
  delay: number;
  channels: number[];
};

export const MAX_PARTS = 20;

/** The fields of a cue that travel between the database, the API, the screens and the file formats. */
export type CueFields = {
  number: number;
  label: string;
  page: string | null;
  upTime: number;
  downTime: number | null;
  /** Wait before the up fade (and the down fade too, unless downDelay says otherwise). */
  delay: number;
  /** Wait before the down fade when it differs from `delay` (a file's `DOWN time delay`); null: as `delay`. */
  downDelay?: number | null;
  follow: number | null;
  link: number | null;
  block: boolean;
  callNote: string | null;
  parts: CuePart[];
};

/** A cue with the levels it records itself (its moves): channel → 0–100. */
export type CueWithMoves = CueFields & { levels: Record<number, number> };

export const CUE_DEFAULTS: Omit<CueFields, "number"> = {
  label: "",
  page: null,
  upTime: 5,
  downTime: null,
  delay: 0,
  downDelay: null,
  follow: null,
  link: null,
  block: false,
  callNote: null,
  parts: [],
};
