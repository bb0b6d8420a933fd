// Bulk numbering for a selection: channels in a run, and DMX addresses packed by footprint.

/** Consecutive channels from `start`, one per fixture in the given order (a step lets a run skip, e.g. by 10). */
export function channelRun(count: number, start: number, step = 1): number[] {
  return Array.from({ length: count }, (_, i) => start + i * step);
}

export type AddressSlot = { universe: number; address: number };

/**
 * Packs fixtures from (universe, address) onward, each taking its footprint. A fixture that would run
 * past slot 512 moves to slot 1 of the next universe: a fixture may not straddle two universes
 * (ANSI E1.11, DMX512-A: slots 1–512).
 */
export function addressRun(footprints: number[], start: AddressSlot, maxUniverse = 63999): AddressSlot[] {
  if (start.address < 1 || start.address > 512) throw new RangeError("The first address must be 1–512.");
  let { universe, address } = start;
  return footprints.map((footprint, i) => {
    if (footprint < 1 || footprint > 512)
      throw new RangeError(`Fixture ${i + 1} has a footprint of ${footprint}; it must be 1–512 slots.`);
    if (address + footprint - 1 > 512) {
      universe += 1;
      address = 1;
    }
    if (universe > maxUniverse) throw new RangeError(`The run goes past universe ${maxUniverse}.`);
    const slot = { universe, address };
    address += footprint;
    return slot;
  });
}
