import "server-only";
// The cues' data layer, split by kind of work: reads (and the cue sheet), writes, and file import.
export * from "./cue-reads";
export * from "./cue-writes";
export * from "./cue-import";
