// Cues: pure helpers (no I/O) shared by the data layer, the route handlers and the screens.
export * from "./cue-number";
export * from "./fade-time";
export * from "./tracking";
export * from "./summary";
export * from "./types";
export * from "./keyboard-entry";
export * from "./parts";
export * from "./running-order";
export * from "./cue-sheet";
export * from "./part-form";
export * from "./unpatched-channels";
