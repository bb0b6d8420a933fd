// The notes' edges: what a client may send to write, change, check channels or set the current cue.
import { z } from "zod";
import { versionSchema } from "@/lib/validation/common";
import { NOTE_KINDS, NOTE_NEEDS, NOTE_PRIORITIES, NOTE_STATUSES, NOTE_SUBJECTS } from "@/models/note-vocabulary";

const id = (what: string) =>
  z
    .number({ error: `${what} must be an id` })
    .int({ error: `${what} must be an id` })
    .positive({ error: `${what} must be an id` });
const oneOf = <T extends readonly [string, ...string[]]>(values: T, what: string) =>
  z.enum(values, { error: `${what} must be one of: ${values.join(", ")}` });

const noteFields = {
  subject: oneOf(NOTE_SUBJECTS, "Subject"),
  subjectId: id("Subject").nullable(),
  body: z
    .string({ error: "Note text is required" })
    .trim()
    .min(1, { error: "Note text is required" })
    .max(2000, { error: "Note text is at most 2,000 characters" }),
  kind: oneOf(NOTE_KINDS, "Kind"),
  priority: oneOf(NOTE_PRIORITIES, "Priority"),
  ownerId: id("Owner").nullable(),
  status: oneOf(NOTE_STATUSES, "Status"),
  needs: z.array(oneOf(NOTE_NEEDS, "Each need"), { error: "Needs must be a list" }).max(NOTE_NEEDS.length),
  dueDate: z.iso.date({ error: "Due date must be a date (YYYY-MM-DD)" }).nullable(),
  dueSession: z
    .string({ error: "Due session must be text" })
    .trim()
    .max(80, { error: "Due session is at most 80 characters" })
    .nullable(),
};

/** The production itself has no subject id; everything else needs one. */
const subjectHasId = (n: { subject?: string; subjectId?: number | null }) =>
  n.subject === undefined || (n.subject === "production" ? n.subjectId == null : n.subjectId != null);
const subjectRule = {
  error: "Choose which one the note is about (or make it a note on the production)",
  path: ["subjectId"],
};

export const createNoteSchema = z
  .object(noteFields)
  .partial({
    subjectId: true,
    priority: true,
    ownerId: true,
    status: true,
    needs: true,
    dueDate: true,
    dueSession: true,
  })
  .strict()
  .refine(subjectHasId, subjectRule);
export type CreateNoteInput = z.output<typeof createNoteSchema>;

export const updateNoteSchema = z
  .object(noteFields)
  .partial()
  .extend({ version: versionSchema })
  .strict()
  .refine((n) => (n.subject === undefined) === (n.subjectId === undefined), {
    error: "Send the subject and its id together",
    path: ["subjectId"],
  })
  .refine(subjectHasId, subjectRule);
export type UpdateNotePatch = z.output<typeof updateNoteSchema>;

export const currentCueSchema = z.object({ cueId: id("Cue").nullable() }).strict();

/** One tap per fixture: good, or faulty with what was seen. */
export const channelCheckSchema = z
  .object({
    results: z
      .array(
        z
          .object({
            fixtureId: id("Fixture"),
            result: z.enum(["good", "faulty"], { error: "Result must be good or faulty" }),
            fault: z.string().trim().max(300, { error: "Fault is at most 300 characters" }).optional(),
          })
          .strict(),
        { error: "Results must be a list" },
      )
      .min(1, { error: "Mark at least one fixture" })
      .max(5000, { error: "At most 5,000 fixtures in one check" }),
    ownerId: id("Owner").nullable().optional(),
  })
  .strict();
export type ChannelCheckInput = z.output<typeof channelCheckSchema>;

/** A point on the plan (metres from the datum) in a cue's state. */
const planCoord = (what: string) =>
  z
    .number({ error: `${what} must be a number of metres` })
    .min(-200, { error: `${what} is more than 200 m from the datum` })
    .max(200, { error: `${what} is more than 200 m from the datum` });
export const spotRequestSchema = z
  .object({ x: planCoord("x"), y: planCoord("y"), cueId: id("Cue").optional() })
  .strict();

/** The stage manager's report: lighting items become notes; the lamp-out and fault log stays with the report. */
const showReportFields = {
  performance: z
    .string({ error: "Performance is required" })
    .trim()
    .min(1, { error: 'Performance is required (e.g. "Evening 3")' })
    .max(80, { error: "Performance is at most 80 characters" }),
  performedOn: z.iso.date({ error: "Date must be a date (YYYY-MM-DD)" }),
  summary: z
    .string({ error: "Summary must be text" })
    .trim()
    .max(4000, { error: "Summary is at most 4,000 characters" }),
  items: z
    .array(
      z
        .object({
          body: noteFields.body,
          kind: noteFields.kind,
          subject: noteFields.subject,
          subjectId: noteFields.subjectId.optional(),
          priority: noteFields.priority.optional(),
          ownerId: noteFields.ownerId.optional(),
        })
        .strict()
        .refine(subjectHasId, subjectRule),
      { error: "Lighting items must be a list" },
    )
    .max(100, { error: "At most 100 lighting items" }),
  faults: z
    .array(
      z
        .object({
          fixtureId: id("Fixture").nullable(),
          kind: z.enum(["lamp_out", "fault"], { error: "Each log entry is a lamp out or a fault" }),
          description: z
            .string({ error: "Say what happened" })
            .trim()
            .min(1, { error: "Say what happened" })
            .max(300, { error: "At most 300 characters" }),
        })
        .strict(),
      { error: "The fault log must be a list" },
    )
    .max(200, { error: "At most 200 log entries" }),
};

/** A new report; `send: false` keeps it as a draft to edit (the default files and sends it at once). */
export const showReportSchema = z
  .object({
    ...showReportFields,
    send: z.boolean({ error: "Send must be true or false" }).optional(),
  })
  .strict();
export type ShowReportInput = z.output<typeof showReportSchema>;
export type ShowReportContent = Omit<ShowReportInput, "send">;

/** A change to a draft report: any of its parts (items and faults replace the lists), with the version read. */
export const updateShowReportSchema = z
  .object(showReportFields)
  .partial()
  .extend({ version: versionSchema })
  .strict()
  .refine((r) => Object.keys(r).some((k) => k !== "version"), {
    error: "Nothing to change: send at least one part of the report",
    path: ["(body)"],
  });
export type UpdateShowReportPatch = z.output<typeof updateShowReportSchema>;

/** Sending a draft: the version read, so a report changed meanwhile is not sent unseen. */
export const sendShowReportSchema = z.object({ version: versionSchema }).strict();
