/**
 * The electrical codes and supply systems a production can choose. The database's enums and the model are
 * built from these lists; lib/checks/electrical.ts adds what each one means (voltage, phases, factor).
 */
export const ELECTRICAL_CODES = ["none", "us-nec", "uk-bs7671", "iec-60364", "other"] as const;
export type ElectricalCode = (typeof ELECTRICAL_CODES)[number];

export const SUPPLY_SYSTEMS = ["120-208-3ph", "120-240-split", "230-400-3ph", "230-1ph", "100-1ph", "by-hand"] as const;
export type SupplySystem = (typeof SUPPLY_SYSTEMS)[number];

/** What a fixture type is electrically; lib/checks/load-kind.ts says how a type without one is read. */
export const LOAD_KINDS = ["lamp", "switch-mode"] as const;
export type LoadKindValue = (typeof LOAD_KINDS)[number];
