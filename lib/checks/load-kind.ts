import type { LoadKind } from "./types";

type TypeFacts = { family: string; loadKind: LoadKind | null };

/** A type's load kind and where it came from: set on the type, or read from its family. */
export type TypeLoadKind = { kind: LoadKind; source: "set" | "family" };

/**
 * Whether a fixture type is a plain lamp load or has its own electronics. The type's own load field
 * decides; when it is empty, an LED family is switch-mode and any other family a lamp. The DMX footprint
 * is no evidence: a single-slot LED unit is still switch-mode, and a 4-slot lamp with a built-in scroller
 * still a lamp. A type read from its family is said so on the checks page, so the electrician can set it.
 */
export function loadKindOfType(type: TypeFacts): TypeLoadKind {
  if (type.loadKind === "lamp" || type.loadKind === "switch-mode") return { kind: type.loadKind, source: "set" };
  return { kind: type.family.startsWith("led") ? "switch-mode" : "lamp", source: "family" };
}

export const LOAD_KIND_RULE =
  "A type's Load field (lamp or switch-mode) decides. Where it is empty, types of an LED family are treated as switch-mode loads (electronic supply) and all others as lamp loads; set it on every LED, moving-light or discharge type of another family.";
