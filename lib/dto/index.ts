// The shapes the data layer returns and the API sends: plain objects with ISO date strings. Types only
// and no 'server-only', so client components, hooks and pure modules import them from here.
export type * from "./accessory";
export type * from "./checks";
export type * from "./cue";
export type * from "./fixture";
export type * from "./fixture-type";
export type * from "./import";
export type * from "./people";
export type * from "./plan";
export type * from "./plot";
export type * from "./production";
export type * from "./studies";
export type * from "./upload";
