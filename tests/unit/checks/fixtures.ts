// Builders for the checks' unit tests: invented units, no real product data.
import type { CheckFixture } from "@/lib/checks";
import type { RiggingFixture } from "@/lib/checks/rigging";

let next = 1;
export function unit(over: Partial<RiggingFixture> = {}): RiggingFixture {
  const id = over.id ?? next++;
  const base: CheckFixture = {
    id,
    label: String(id),
    positionId: 1,
    fixtureTypeId: 1,
    typeName: "Test profile",
    dmxMode: "dimmer",
    universe: null,
    address: null,
    footprint: 1,
    channel: null,
    circuit: null,
    dimmer: null,
    wattage: 750,
    weightKg: 8,
    loadKind: "lamp",
    bodyKey: null,
  };
  return { ...base, alongM: null, ...over, id };
}
