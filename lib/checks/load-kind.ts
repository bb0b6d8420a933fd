import type { LoadKind } from "./types";

type TypeFacts = { family: string; dmxModes: { name: string; footprint: number }[] };

/**
 * Whether a fixture type is a plain lamp load or has its own electronics. Throwline's types carry no
 * explicit flag, so this reads what they do say: LED families are switch-mode, and a unit that takes
 * more than one DMX slot in any mode (colour mixing, moving heads, scrollers built in) has an electronic
 * supply. A conventional unit has one "dimmer" slot. A single-slot LED unit would be misread as a lamp:
 * the checks page says this rule in words so the electrician can spot it.
 */
export function loadKindOfType(type: TypeFacts): LoadKind {
  if (type.family.startsWith("led")) return "switch-mode";
  if (type.dmxModes.some((m) => m.footprint > 1)) return "switch-mode";
  return "lamp";
}

export const LOAD_KIND_RULE =
  "Units of an LED family, and units that take more than one DMX slot in any mode, are treated as switch-mode loads (electronic supply); single-slot units as lamp loads.";
