import { z } from "zod";

/** A length in metres with a readable range message. */
export const metres = (min: number, max: number, what: string) =>
  z
    .number({ error: `${what} must be a number of metres` })
    .refine(Number.isFinite, { error: `${what} must be a finite number` })
    .min(min, { error: `${what} must be at least ${min} m` })
    .max(max, { error: `${what} must be at most ${max} m` });

export const versionSchema = z.number({ error: "version is required (the version you last read)" }).int().positive();
