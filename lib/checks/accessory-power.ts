// Accessories on the power check: a scroller, gobo rotator or motorised iris draws from its host unit's
// circuit, so its wattage (VA: they all have electronic drivers) adds to that circuit's load. Pure.
import type { CheckAccessory } from "./types";

/** Kinds that always carry a motor or driver, whatever was entered for their DMX. */
const POWERED_KINDS = new Set(["scroller", "gobo rotator", "colour changer", "color changer", "iris motor"]);

/**
 * Whether an accessory takes power: a wattage entered, a DMX patch (anything addressed has electronics), or a
 * kind that is always motorised. Barn doors, hats, frames and safety cables draw nothing, so a missing
 * wattage on them is no gap in the totals; on a powered one it is ("not counted", never 0 W).
 */
export function drawsPower(a: Pick<CheckAccessory, "kind" | "wattage" | "address" | "footprint">): boolean {
  if (a.wattage != null && a.wattage > 0) return true;
  if (a.address != null || a.footprint != null) return true;
  return POWERED_KINDS.has(a.kind.trim().toLowerCase());
}

/** One powered accessory as a circuit lists it: on which unit, what, and its VA (null: not entered). */
export type AccessoryLoad = {
  accessoryId: number;
  fixtureId: number;
  unit: string;
  kind: string;
  wattage: number | null;
};

/** The powered accessories of each host fixture, by fixture id. */
export function poweredAccessoriesByHost(accessories: CheckAccessory[]): Map<number, CheckAccessory[]> {
  const byHost = new Map<number, CheckAccessory[]>();
  for (const a of accessories) {
    if (!drawsPower(a)) continue;
    const list = byHost.get(a.fixtureId);
    if (list) list.push(a);
    else byHost.set(a.fixtureId, [a]);
  }
  return byHost;
}
