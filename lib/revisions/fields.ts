// Which snapshot fields belong to which group of the change list, and their words. One home for the
// grouping, read by the diff, the restore (which fields it may write back) and the marker tooltips.
import { FIXTURE_FIELDS } from "@/lib/rig/fixture-fields";

/** Fixture attributes that are state on the deck, not paperwork: never snapshotted, compared or restored. */
export const FIXTURE_STATE_ONLY = new Set(["hung", "focused", "focusPhotoUploadId"]);

/** The fixture attributes a snapshot keeps, in the registry's (and the rig table's) order. */
export const FIXTURE_SNAPSHOT_FIELDS: string[] = FIXTURE_FIELDS.map((f) => f.attribute as string).filter(
  (a) => !FIXTURE_STATE_ONLY.has(a),
);

export const FIXTURE_GROUP_FIELDS = {
  refocused: [
    "focusPointId",
    "focusX",
    "focusY",
    "aim",
    "coneDeg",
    "softnessDeg",
    "irisPercent",
    "goboRotationDeg",
    "barnDoorTop",
    "barnDoorBottom",
    "barnDoorLeft",
    "barnDoorRight",
    "shutterCuts",
    "focusNotes",
  ],
  repatched: ["channel", "universe", "address", "dmxMode", "footprint", "circuit", "dimmer"],
  recoloured: ["colour"],
} as const;

/** Id fields are compared as ids but shown by the name the snapshot keeps beside them. */
export const FIXTURE_SHOWN_AS: Record<string, string> = {
  positionId: "positionName",
  fixtureTypeId: "typeName",
  focusPointId: "focusPointName",
};

const FIXTURE_LABELS: Record<string, string> = Object.fromEntries(
  FIXTURE_FIELDS.map((f) => [f.attribute as string, f.header]),
);
export const fixtureFieldLabel = (attribute: string) => FIXTURE_LABELS[attribute] ?? attribute;

export const CUE_SNAPSHOT_FIELDS = [
  "number",
  "label",
  "page",
  "upTime",
  "downTime",
  "delay",
  "downDelay",
  "follow",
  "link",
  "block",
  "callNote",
  "parts",
] as const;

export const CUE_TIMING_FIELDS = new Set(["upTime", "downTime", "delay", "downDelay", "follow", "link", "parts"]);

const CUE_LABELS: Record<string, string> = {
  number: "Cue number",
  label: "Label",
  page: "Page",
  upTime: "Up time",
  downTime: "Down time",
  delay: "Delay",
  downDelay: "Down delay",
  follow: "Follow",
  link: "Link",
  block: "Block",
  callNote: "Call note",
  parts: "Parts",
};
export const cueFieldLabel = (field: string) => CUE_LABELS[field] ?? field;

/** How a fixture is named in the change list: where it hangs, its unit and channel. */
export function fixtureName(f: { positionName: string; unitNumber?: unknown; channel?: unknown }): string {
  const channel = f.channel == null ? "" : ` (channel ${f.channel})`;
  return `${f.positionName} unit ${f.unitNumber ?? "?"}${channel}`;
}

export function cueName(c: { number: number; label?: unknown }): string {
  return c.label ? `Cue ${c.number} "${c.label}"` : `Cue ${c.number}`;
}
