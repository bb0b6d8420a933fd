import "server-only";
// Notes: written by any member against the production or one thing in it, closed by the roles the policy
// names for the note's kind, each write in one transaction with its change-log entry.
import { QueryTypes, type Transaction } from "sequelize";
import { getDb, type Note } from "@/models";
import { AppError, forbidden, notFound } from "@/lib/errors";
import { canCloseNote, type Member } from "@/lib/auth/policy";
import type { CreateNoteInput, UpdateNotePatch } from "@/lib/notes/schemas";
import type { CurrentCueDto, NoteDto } from "@/lib/notes/dto";
import {
  CLOSED_STATUSES,
  NOTE_NEEDS,
  type NoteNeed,
  type NoteOrigin,
  type NoteStatus,
  type NoteSubject,
} from "@/models/note-vocabulary";
import { getMembership } from "./memberships";
import { plain } from "./plain";
import { productionCrud } from "./production-crud";
import { recordChange } from "./changes";
import { inTransaction } from "./transaction";
import { versionedUpdate } from "./versioned";

const NEED_COLUMNS: Record<NoteNeed, "needsAccess" | "needsDark" | "needsDesigner" | "needsIsolated"> = {
  access: "needsAccess",
  dark: "needsDark",
  designer: "needsDesigner",
  isolated: "needsIsolated",
};

export function toNoteDto(n: Note): NoteDto {
  const base = plain(n, [
    "id",
    "productionId",
    "subject",
    "subjectId",
    "body",
    "kind",
    "priority",
    "ownerId",
    "status",
    "dueDate",
    "dueSession",
    "authorId",
    "runningCueId",
    "runningCueNumber",
    "origin",
    "showReportId",
    "closedBy",
    "closedAt",
    "version",
    "createdAt",
    "updatedAt",
  ]);
  return { ...base, needs: NOTE_NEEDS.filter((k) => Boolean(n[NEED_COLUMNS[k]])) };
}

function needColumns(needs: NoteNeed[] | undefined): Partial<Record<(typeof NEED_COLUMNS)[NoteNeed], boolean>> {
  if (needs === undefined) return {};
  return Object.fromEntries(NOTE_NEEDS.map((k) => [NEED_COLUMNS[k], needs.includes(k)]));
}

const isClosed = (s: NoteStatus) => CLOSED_STATUSES.includes(s);

const SUBJECT_TABLES: Record<Exclude<NoteSubject, "production">, { table: string; what: string }> = {
  position: { table: "positions", what: "Position" },
  fixture: { table: "fixtures", what: "Fixture" },
  cue: { table: "cues", what: "Cue" },
  focus_point: { table: "focus_points", what: "Focus point" },
};

/** The note's subject must be a row of this production; a 400 names the field (`field`, subjectId by default). */
export async function checkSubject(
  productionId: number,
  subject: NoteSubject,
  subjectId: number | null,
  transaction: Transaction,
  field = "subjectId",
) {
  if (subject === "production") return;
  const { table, what } = SUBJECT_TABLES[subject];
  const rows = await getDb().sequelize.query(`SELECT id FROM ${table} WHERE id = ? AND production_id = ?`, {
    replacements: [subjectId, productionId],
    type: QueryTypes.SELECT,
    transaction,
  });
  if (!rows.length)
    throw new AppError("bad_request", `${what} ${subjectId} is not in this production.`, {
      fieldErrors: { [field]: [`no such ${what.toLowerCase()}`] },
    });
}

/** An owner must be a member of the production. */
async function checkOwner(productionId: number, ownerId: number | null | undefined, transaction: Transaction) {
  if (ownerId == null) return;
  const row = await getDb().Membership.findOne({ where: { productionId, userId: ownerId }, transaction });
  if (!row)
    throw new AppError("bad_request", "The owner must be a member of this production.", {
      fieldErrors: { ownerId: ["not a member of this production"] },
    });
}

type NewNote = CreateNoteInput & { authorId: number; origin?: NoteOrigin; showReportId?: number | null };

const notes = productionCrud<Note, NoteDto, NewNote, UpdateNotePatch>({
  model: () => getDb().Note,
  entity: "note",
  what: "Note",
  toDto: toNoteDto,
  order: [
    ["createdAt", "DESC"],
    ["id", "DESC"],
  ],
});

/** The values a new note is written with: subject and owner checked, the current cue picked up, a closed note's closer recorded. */
async function prepareNote(input: NewNote, productionId: number, transaction: Transaction) {
  const { needs, ...rest } = input;
  const subjectId = input.subject === "production" ? null : (input.subjectId ?? null);
  await checkSubject(productionId, input.subject, subjectId, transaction);
  await checkOwner(productionId, input.ownerId, transaction);
  const running = await readCurrentCue(productionId, transaction);
  const status = input.status ?? "open";
  // A note may be written already closed ("done on the spot") only by someone who may close that kind.
  if (isClosed(status)) {
    const member = await memberOf(productionId, input.authorId);
    if (!canCloseNote(member, input.kind))
      throw forbidden(`Your role on this production cannot close a ${input.kind} note.`);
  }
  return {
    ...rest,
    productionId,
    subjectId,
    status,
    ...needColumns(needs),
    runningCueId: running.cueId,
    runningCueNumber: running.number,
    ...(isClosed(status) ? { closedBy: input.authorId, closedAt: new Date() } : {}),
  };
}

/** Writes one note with its change-log entry inside the caller's transaction (a show report writes several). */
export async function insertNote(
  transaction: Transaction,
  {
    productionId,
    userId,
    input,
    origin,
    showReportId,
  }: {
    productionId: number;
    userId: number;
    input: CreateNoteInput;
    origin?: NoteOrigin;
    showReportId?: number | null;
  },
): Promise<NoteDto> {
  const values = await prepareNote(
    { ...input, authorId: userId, origin: origin ?? "written", showReportId: showReportId ?? null },
    productionId,
    transaction,
  );
  const row = await getDb().Note.create(values as never, { transaction });
  const dto = toNoteDto(row);
  await recordChange(
    { productionId, userId, entity: "note", entityId: row.id, action: "create", after: dto },
    transaction,
  );
  return dto;
}

async function memberOf(productionId: number, userId: number): Promise<Member | null> {
  const m = await getMembership({ userId, productionId });
  return m ? { role: m.role, isOwner: m.isOwner } : null;
}

export const getNotesByProduction = notes.list;

export async function createNote(args: {
  productionId: number;
  userId: number;
  input: CreateNoteInput;
}): Promise<NoteDto> {
  return inTransaction((transaction) => insertNote(transaction, args));
}

/**
 * Any member may change an open note; closing it (done, cannot do), reopening it, or changing the kind of a
 * closed one needs the close right for its kind (the old kind and the new one). Closing records who and when.
 */
export async function updateNote({
  productionId,
  id,
  userId,
  patch,
}: {
  productionId: number;
  id: number;
  userId: number;
  patch: UpdateNotePatch;
}): Promise<NoteDto> {
  const { version, needs, ...fields } = patch;
  const changes: Record<string, unknown> = { ...fields, ...needColumns(needs) };
  if (!Object.keys(changes).length) throw new AppError("bad_request", "Nothing to change: send at least one field.");
  const member = await memberOf(productionId, userId);
  return inTransaction(async (transaction) => {
    const current = await getDb().Note.findOne({ where: { productionId, id }, transaction, lock: true });
    if (!current) throw notFound("Note");
    const wasClosed = isClosed(current.status);
    const willBeClosed = isClosed(patch.status ?? current.status);
    const kinds = new Set([current.kind, patch.kind ?? current.kind]);
    if (wasClosed || willBeClosed) {
      for (const kind of kinds) {
        if (!canCloseNote(member, kind)) {
          throw new AppError(
            "forbidden",
            `Your role on this production cannot ${wasClosed && !willBeClosed ? "reopen" : "close"} a ${kind} note.`,
            { fieldErrors: { status: [`closing a ${kind} note is not your role's`] } },
          );
        }
      }
    }
    if (patch.subject !== undefined)
      await checkSubject(
        productionId,
        patch.subject,
        patch.subject === "production" ? null : (patch.subjectId ?? null),
        transaction,
      );
    if (patch.subject === "production") changes.subjectId = null;
    if (patch.ownerId !== undefined) await checkOwner(productionId, patch.ownerId, transaction);
    if (!wasClosed && willBeClosed) Object.assign(changes, { closedBy: userId, closedAt: new Date() });
    if (wasClosed && !willBeClosed) Object.assign(changes, { closedBy: null, closedAt: null });
    const { before, after } = await versionedUpdate({
      model: getDb().Note,
      scope: { productionId },
      id,
      version,
      changes,
      toDto: toNoteDto,
      what: "Note",
      transaction,
    });
    const afterDto = toNoteDto(after);
    await recordChange(
      {
        productionId,
        userId,
        entity: "note",
        entityId: id,
        action: "update",
        before: toNoteDto(before),
        after: afterDto,
      },
      transaction,
    );
    return afterDto;
  });
}

/** The author may take back their own note; otherwise it takes the right to close its kind. */
export async function deleteNote({
  productionId,
  id,
  userId,
}: {
  productionId: number;
  id: number;
  userId: number;
}): Promise<void> {
  const row = await getDb().Note.findOne({ where: { productionId, id } });
  if (!row) throw notFound("Note");
  if (row.authorId !== userId && !canCloseNote(await memberOf(productionId, userId), row.kind)) {
    throw forbidden(`Only the author, or a role that closes ${row.kind} notes, may delete this note.`);
  }
  await notes.remove({ productionId, id, userId });
}

// ---- the production's current cue, which new notes pick up ----

async function readCurrentCue(productionId: number, transaction?: Transaction): Promise<CurrentCueDto> {
  const rows = await getDb().sequelize.query<{ cueId: number | null; number: string | null; label: string | null }>(
    `SELECT c.id AS cueId, c.number AS number, c.label AS label
       FROM productions p LEFT JOIN cues c ON c.id = p.current_cue_id AND c.production_id = p.id
      WHERE p.id = ?`,
    { replacements: [productionId], type: QueryTypes.SELECT, transaction },
  );
  const r = rows[0];
  if (!r || r.cueId == null) return { cueId: null, number: null, label: null };
  return { cueId: Number(r.cueId), number: formatCueNumber(r.number), label: r.label || null };
}

/** A DECIMAL(10,3) cue number as the cue list shows it ("12.500" → "12.5"). */
function formatCueNumber(n: string | number | null): string | null {
  if (n == null) return null;
  return String(Number(n));
}

export async function getCurrentCue({ productionId }: { productionId: number }): Promise<CurrentCueDto> {
  return readCurrentCue(productionId);
}

export async function setCurrentCue({
  productionId,
  userId,
  cueId,
}: {
  productionId: number;
  userId: number;
  cueId: number | null;
}): Promise<CurrentCueDto> {
  return inTransaction(async (transaction) => {
    if (cueId != null) {
      const cue = await getDb().Cue.findOne({ where: { productionId, id: cueId }, transaction });
      if (!cue)
        throw new AppError("bad_request", `Cue ${cueId} is not in this production.`, {
          fieldErrors: { cueId: ["no such cue"] },
        });
    }
    const before = await readCurrentCue(productionId, transaction);
    await getDb().sequelize.query("UPDATE productions SET current_cue_id = ? WHERE id = ?", {
      replacements: [cueId, productionId],
      transaction,
    });
    const after = await readCurrentCue(productionId, transaction);
    await recordChange(
      { productionId, userId, entity: "currentCue", entityId: productionId, action: "update", before, after },
      transaction,
    );
    return after;
  });
}
