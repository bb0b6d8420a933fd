import type { CueFields, SheetFacts } from "@/lib/cues";

export type CueDto = CueFields & { id: number; version: number; levels: Record<number, number>; updatedAt: string };
export type CueSheetRow = CueDto & SheetFacts;
/** What a channel lights, from the rig: purposes, focus points (acting areas) and unit names. */
export type ChannelLabel = { channel: number; purposes: string[]; areas: string[]; units: string[] };
export type ImportOutcome = { imported: number; notices: Array<{ line: number; message: string }> };
