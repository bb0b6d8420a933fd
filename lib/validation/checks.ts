import { z } from "zod";
import { CIRCUIT_POWER } from "@/models/circuit";
import { ELECTRICAL_CODES, SUPPLY_SYSTEMS } from "@/lib/checks/electrical";
import { MAX_UNIVERSE } from "@/lib/checks/dmx";
import { versionSchema } from "./common";

// Circuits, data lines and the production's electrical and rigging settings, as the checks page edits them.

const circuitName = z
  .string({ error: "Circuit name is required" })
  .trim()
  .min(1, { error: "Circuit name is required" })
  .max(20, { error: "Circuit name is at most 20 characters" });
const universe = z
  .number({ error: "Universe must be a whole number" })
  .int({ error: "Universe must be a whole number" })
  .min(1, { error: "Universe must be 1 or more" })
  .max(MAX_UNIVERSE, { error: `Universe must be at most ${MAX_UNIVERSE}` });

export const circuitFieldsSchema = z.object({
  name: circuitName,
  ratingA: z
    .number({ error: "Rating must be a number of amps" })
    .refine(Number.isFinite, { error: "Rating must be a finite number of amps" })
    .gt(0, { error: "Rating must be above 0 A" })
    .max(2000, { error: "Rating must be at most 2000 A" }),
  phase: z
    .string()
    .trim()
    .max(8, { error: "Phase is at most 8 characters" })
    .nullable()
    .transform((p) => (p ? p : null)),
  power: z.enum(CIRCUIT_POWER, { error: "Power must be dimmed, non-dim or constant" }),
});
export const createCircuitSchema = circuitFieldsSchema.partial({ phase: true, power: true }).strict();
export const updateCircuitSchema = circuitFieldsSchema.partial().extend({ version: versionSchema }).strict();
/** Many circuits at once (a rack of dimmers): all or nothing. */
export const createCircuitsSchema = z
  .object({
    circuits: z
      .array(createCircuitSchema)
      .min(1, { error: "Send at least one circuit" })
      .max(5000, { error: "At most 5,000 circuits at once" }),
  })
  .strict();

const fixtureIds = z
  .array(z.number({ error: "Units are fixture ids" }).int().positive(), {
    error: "Units must be a list of fixture ids",
  })
  .max(2000, { error: "At most 2,000 units on one data line" });
export const dataLineFieldsSchema = z.object({
  name: z
    .string({ error: "Data line name is required" })
    .trim()
    .min(1, { error: "Data line name is required" })
    .max(60, { error: "Data line name is at most 60 characters" }),
  universe: universe.nullable(),
  fixtureIds,
});
export const createDataLineSchema = dataLineFieldsSchema.partial({ universe: true, fixtureIds: true }).strict();
export const updateDataLineSchema = dataLineFieldsSchema.partial().extend({ version: versionSchema }).strict();

export const electricalSettingsFieldsSchema = z.object({
  electricalCode: z.enum(ELECTRICAL_CODES, { error: "Choose an electrical code from the list" }),
  supplySystem: z.enum(SUPPLY_SYSTEMS, { error: "Choose a supply system from the list" }),
  voltage: z
    .number({ error: "Voltage must be a number of volts" })
    .int({ error: "Voltage must be a whole number of volts" })
    .min(1, { error: "Voltage must be above 0 V" })
    .max(480, { error: "Voltage must be at most 480 V (phase to neutral)" }),
  derating: z
    .number({ error: "Continuous-load factor must be a number" })
    .min(0.5, { error: "Continuous-load factor must be at least 0.5 (50 %)" })
    .max(1, { error: "Continuous-load factor must be at most 1 (100 %)" })
    .nullable(),
  cableKgPerM: z
    .number({ error: "Cable weight must be kilograms per metre" })
    .min(0, { error: "Cable weight cannot be negative" })
    .max(20, { error: "Cable weight must be at most 20 kg/m" }),
  hardwareKgPerUnit: z
    .number({ error: "Hardware allowance must be kilograms" })
    .min(0, { error: "Hardware allowance cannot be negative" })
    .max(50, { error: "Hardware allowance must be at most 50 kg a unit" }),
});
export const updateElectricalSettingsSchema = electricalSettingsFieldsSchema
  .partial()
  .extend({ version: versionSchema })
  .strict();

export const updateLiftLinesSchema = z
  .object({
    liftLines: z
      .number({ error: "Lift lines must be a whole number" })
      .int({ error: "Lift lines must be a whole number" })
      .min(2, { error: "A flown pipe has at least 2 lift lines" })
      .max(20, { error: "At most 20 lift lines" })
      .nullable(),
    version: versionSchema,
  })
  .strict();
