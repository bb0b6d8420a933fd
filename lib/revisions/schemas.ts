// The checks at the revisions' edges: issuing, comparing, restoring, the equipment list, a thing's history.
import { z } from "zod";
import { REVISION_PURPOSES } from "@/models/revision-purposes";

const id = (what: string) =>
  z.coerce
    .number({ error: `${what} must be a number` })
    .int({ error: `${what} must be a whole number` })
    .positive({
      error: `${what} must be a positive id`,
    });

export const issueRevisionSchema = z.strictObject({
  /** Empty or absent: the next free letter. */
  label: z
    .string({ error: "label must be text" })
    .trim()
    .max(40, { error: "label: at most 40 characters" })
    .regex(/^[\p{L}\p{N} ._\-/#()]*$/u, { error: "label: letters, digits, spaces and . _ - / # ( ) only" })
    .optional(),
  issuedFor: z.enum(REVISION_PURPOSES, { error: `issued for: one of ${REVISION_PURPOSES.join(", ")}` }),
  note: z
    .string({ error: "note must be text" })
    .trim()
    .max(4000, { error: "note: at most 4000 characters" })
    .optional(),
  /** Spares on the shop's add / return list mailed with this revision. */
  sparesPercent: z
    .number({ error: "spares must be a number" })
    .min(0, { error: "spares: 0 % or more" })
    .max(100, { error: "spares: at most 100 %" })
    .optional(),
});
export type IssueRevisionInput = z.infer<typeof issueRevisionSchema>;

/** A revision's id, or "current" for the paperwork as it stands now. */
const side = (what: string) => z.union([z.literal("current"), id(what)], { error: `${what}: a revision or "current"` });

export const compareQuerySchema = z.strictObject({ from: side("from"), to: side("to") });

export const restoreSchema = z.strictObject({
  entity: z.enum(["fixture", "cue"], { error: "entity: fixture or cue" }),
  id: id("id"),
  version: z.number({ error: "version is required (the version you last read)" }).int().positive(),
});

export const sparesSchema = z.coerce
  .number({ error: "spares must be a number" })
  .min(0, { error: "spares: 0 % or more" })
  .max(100, { error: "spares: at most 100 %" });

export const equipmentQuerySchema = z.strictObject({
  /** The revision the list is of, or "current". */
  of: side("of").optional(),
  /** With `from`: the add / return list from that revision to `of`. */
  from: side("from").optional(),
  spares: sparesSchema.optional(),
  format: z.enum(["json", "csv", "xlsx"], { error: "format: json, csv or xlsx" }).optional(),
});

export const HISTORY_ENTITIES = ["fixture", "position", "cue", "fixtureType"] as const;
export const historyQuerySchema = z.strictObject({
  entity: z.enum(HISTORY_ENTITIES, { error: `entity: one of ${HISTORY_ENTITIES.join(", ")}` }),
  id: id("id"),
});

export const shopEmailSchema = z.strictObject({
  shopEmail: z.union([z.literal(""), z.email({ error: "shop e-mail: not an e-mail address" }).max(254)], {
    error: "shop e-mail: an e-mail address, or empty for none",
  }),
});

export const revisionMailChoiceSchema = z.strictObject({
  receive: z.boolean({ error: "receive: true or false" }),
});
