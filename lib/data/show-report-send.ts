import "server-only";
// Sending a show report: inside the caller's transaction, each stored lighting item becomes a note for the
// person who does that kind of job, each lamp out or fault logged on a unit a work note, and the report is
// marked sent (read-only from then on). The e-mail goes after the commit (lib/notes/show-report-mail.ts).
import type { Transaction } from "sequelize";
import { getDb, type ShowReport } from "@/models";
import { reportItems } from "./show-report-items";
import type { NoteDto } from "@/lib/notes/dto";
import { defaultOwner } from "@/lib/notes/routing";
import type { Role } from "@/models/roles";
import { insertNote, toNoteDto } from "./notes";
import { recordChange } from "./changes";

export type SendContext = {
  productionId: number;
  userId: number;
  team: Array<{ userId: number; role: Role }>;
  running: { cueId: number | null; number: string | null };
};

/** Writes the report's notes and marks it sent; the row must be a draft locked by the caller. */
export async function sendDraft(transaction: Transaction, report: ShowReport, ctx: SendContext): Promise<NoteDto[]> {
  const { ShowReportFault, Fixture, Note } = getDb();
  const { productionId, userId, team, running } = ctx;
  const [items, faults] = [
    await reportItems().findAll({ where: { showReportId: report.id }, order: [["sortOrder", "ASC"]], transaction }),
    await ShowReportFault.findAll({ where: { showReportId: report.id }, order: [["id", "ASC"]], transaction }),
  ];
  const notes: NoteDto[] = [];
  for (const item of items) {
    // Subjects and owners are checked the same way as any note's.
    const input = {
      body: item.body,
      kind: item.kind,
      subject: item.subject,
      subjectId: item.subjectId,
      ...(item.priority ? { priority: item.priority } : {}),
      ownerId: item.ownerId ?? defaultOwner(item.kind, team),
    };
    notes.push(
      await insertNote(transaction, { productionId, userId, input, origin: "show_report", showReportId: report.id }),
    );
  }
  const unitIds = faults.map((f) => f.fixtureId).filter((id): id is number => id != null);
  const units = unitIds.length
    ? await Fixture.findAll({
        where: { productionId, id: unitIds },
        attributes: ["id", "unitNumber", "channel"],
        raw: true,
        transaction,
      })
    : [];
  for (const f of faults) {
    const unit = units.find((x) => x.id === f.fixtureId);
    if (!unit) continue; // an entry on no unit (or a unit since removed) stays in the log only
    const row = await Note.create(
      {
        productionId,
        subject: "fixture",
        subjectId: unit.id,
        kind: "work",
        priority: "high",
        ownerId: defaultOwner("work", team),
        needsAccess: true,
        dueDate: null,
        dueSession: "before the next performance",
        authorId: userId,
        origin: "show_report",
        showReportId: report.id,
        runningCueId: running.cueId,
        runningCueNumber: running.number,
        closedBy: null,
        closedAt: null,
        body: `${f.kind === "lamp_out" ? "Lamp out" : "Fault"} in ${report.performance} (unit ${unit.unitNumber}${unit.channel != null ? `, channel ${unit.channel}` : ""}): ${f.description}`,
      },
      { transaction },
    );
    const dto = toNoteDto(row);
    await recordChange(
      { productionId, userId, entity: "note", entityId: row.id, action: "create", after: dto },
      transaction,
    );
    notes.push(dto);
  }
  // The row is locked by the caller, so the version read with it is still the stored one.
  await report.update({ sentAt: new Date(), sentBy: userId, version: report.version + 1 }, { transaction });
  return notes;
}
