// The plain-words cautions every checks view and export carries.

export const CHECK_CAUTIONS: string[] = [
  "These figures are planning aids, not an engineering or electrical approval.",
  "Loads and rigging must be verified by a qualified electrician and a qualified rigger against the venue's own ratings, the equipment's documentation and local codes and regulations.",
  "Rated loads are the ones entered here; the venue's posted ratings govern. A computed figure is never a statement that something is safe.",
];

export const POWER_CAUTIONS: string[] = [
  "Switch-mode loads (LED units, moving lights, discharge lamps) draw a large inrush current at power-up: bring them up in stages and check the breakers' trip curves.",
  "Switch-mode loads are not linear: on a three-phase supply their harmonics add up in the neutral, which can carry more current than a phase even when the phases are balanced. Size the neutral for it.",
  "Switch-mode units are counted at their wattage as VA; where the data sheet gives a power factor below 1 or an input current, the current is higher: use the data sheet.",
  "Powered accessories (scrollers, gobo rotators, motorised irises) are counted on their host unit's circuit. Where one takes its own power supply, that supply carries the load instead; its own rating and circuit must be checked too.",
];

export const DMX_CAUTIONS: string[] = [
  "Every data run needs a terminator at its last device; a splitter or buffer starts a new segment.",
];
