// The saved views of the rig, each named for the job it serves. A view is a starting point: on screen
// a person can still sort, filter, group and choose columns.

export type RigViewId = "hang" | "patch" | "program" | "focus" | "all" | "stock";
export type RigView = {
  id: RigViewId;
  label: string;
  description: string;
  columns: string[]; // column ids from lib/rig/columns
  sort: Array<{ id: string; desc?: boolean }>;
  groupBy?: string;
};

const ALL = [
  "position",
  "unitNumber",
  "type",
  "channel",
  "universe",
  "address",
  "dmxMode",
  "footprint",
  "circuit",
  "dimmer",
  "colour",
  "gobo",
  "purpose",
  "x",
  "y",
  "lensHeight",
  "focusPoint",
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
  "hung",
  "focused",
  "notes",
  "focusNotes",
  "bodyKey",
  "cell",
  "throw",
  "deckLength",
  "deckWidth",
  "headLength",
  "headWidth",
  "softBandFar",
];

export const RIG_VIEWS: RigView[] = [
  {
    id: "hang",
    label: "Hanging",
    description: "Pipe by pipe, unit by unit: what goes up where, with its colour, gobo and circuit.",
    columns: [
      "position",
      "unitNumber",
      "type",
      "purpose",
      "colour",
      "gobo",
      "circuit",
      "dimmer",
      "channel",
      "hung",
      "notes",
    ],
    sort: [{ id: "position" }, { id: "unitNumber" }],
    groupBy: "position",
  },
  {
    id: "patch",
    label: "Patching",
    description: "Universe and address order, with footprints, for setting up the data line.",
    columns: [
      "universe",
      "address",
      "footprint",
      "dmxMode",
      "channel",
      "position",
      "unitNumber",
      "type",
      "circuit",
      "dimmer",
    ],
    sort: [{ id: "universe" }, { id: "address" }],
  },
  {
    id: "program",
    label: "Programming",
    description: "Channel order: what each channel is, where it hangs and what it is for.",
    columns: ["channel", "purpose", "position", "unitNumber", "type", "colour", "gobo", "universe", "address"],
    sort: [{ id: "channel" }],
  },
  {
    id: "focus",
    label: "Focus values",
    description:
      "Marks, lens heights, cones and the computed throw and pools at the deck and at head height; values a unit takes from its type or its position's trim are marked as inherited.",
    columns: [
      "position",
      "unitNumber",
      "type",
      "focusPoint",
      "focusX",
      "focusY",
      "aim",
      "lensHeight",
      "coneDeg",
      "softnessDeg",
      "goboRotationDeg",
      "throw",
      "deckLength",
      "deckWidth",
      "headLength",
      "headWidth",
      "softBandFar",
      "focused",
      "focusNotes",
    ],
    sort: [{ id: "position" }, { id: "unitNumber" }],
  },
  {
    id: "all",
    label: "Every column",
    description: "Every stored field and every computed value.",
    columns: ALL,
    sort: [{ id: "position" }, { id: "unitNumber" }],
  },
  {
    id: "stock",
    label: "Pulling stock",
    description: "What to pull from the shop: units by type, colour cuts, gobos, accessories and Y-cables.",
    columns: [],
    sort: [],
  },
];

export const VIEW_BY_ID = new Map(RIG_VIEWS.map((v) => [v.id, v]));
export const isRigViewId = (v: string): v is RigViewId => VIEW_BY_ID.has(v as RigViewId);
