/** The fields of a cue that travel between the database, the API, the screens and the file formats. */
export type CueFields = {
  number: number;
  label: string;
  page: string | null;
  upTime: number;
  downTime: number | null;
  delay: number;
  follow: number | null;
  link: number | null;
  block: boolean;
  callNote: string | null;
};

/** A cue with the levels it records itself (its moves): channel → 0–100. */
export type CueWithMoves = CueFields & { levels: Record<number, number> };

export const CUE_DEFAULTS: Omit<CueFields, "number"> = {
  label: "",
  page: null,
  upTime: 5,
  downTime: null,
  delay: 0,
  follow: null,
  link: null,
  block: false,
  callNote: null,
};
