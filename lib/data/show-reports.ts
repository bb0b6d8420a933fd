import "server-only";
// The stage manager's show report. Filed as a draft (kept, editable, nothing written yet) or sent at once;
// sending writes, in one transaction, a note for each lighting item (owned by the right person) and for each
// lamp out or fault logged on a unit, and the report becomes read-only. Every edit is versioned (409 when
// stale) and recorded in the change log.
import type { Transaction } from "sequelize";
import { getDb, type ShowReport, type ShowReportFault } from "@/models";
import type { ShowReportItem } from "@/models/show-report";
import { reportItems } from "./show-report-items";
import { AppError, notFound } from "@/lib/errors";
import type { ShowReportContent, ShowReportInput, UpdateShowReportPatch } from "@/lib/notes/schemas";
import type { NoteDto, ShowReportDto, ShowReportFaultDto, ShowReportItemDto } from "@/lib/notes/dto";
import { getTeamByProduction } from "./memberships";
import { checkSubject, getCurrentCue } from "./notes";
import { plain } from "./plain";
import { recordChange } from "./changes";
import { inTransaction } from "./transaction";
import { sendDraft, type SendContext } from "./show-report-send";

const toFault = (f: ShowReportFault): ShowReportFaultDto => plain(f, ["id", "fixtureId", "kind", "description"]);
const toItem = (i: ShowReportItem): ShowReportItemDto =>
  plain(i, ["id", "body", "kind", "subject", "subjectId", "priority", "ownerId"]);
const toReport = (
  r: ShowReport,
  parts: { faults: ShowReportFault[]; items: ShowReportItem[]; noteIds: number[] },
): ShowReportDto => ({
  ...plain(r, [
    "id",
    "performance",
    "performedOn",
    "summary",
    "authorId",
    "sentAt",
    "sentBy",
    "version",
    "createdAt",
    "updatedAt",
  ]),
  status: r.sentAt ? "sent" : "draft",
  faults: parts.faults.map(toFault),
  items: parts.items.map(toItem),
  noteIds: parts.noteIds,
});

/** The reports with their parts, newest performance first. */
async function readReports(
  productionId: number,
  reports: ShowReport[],
  transaction?: Transaction,
): Promise<ShowReportDto[]> {
  const { ShowReportFault, Note } = getDb();
  const ids = reports.map((r) => r.id);
  if (!ids.length) return [];
  const faults = await ShowReportFault.findAll({ where: { showReportId: ids }, order: [["id", "ASC"]], transaction });
  const items = await reportItems().findAll({
    where: { showReportId: ids },
    order: [
      ["sortOrder", "ASC"],
      ["id", "ASC"],
    ],
    transaction,
  });
  const notes = await Note.findAll({
    where: { productionId, showReportId: ids },
    attributes: ["id", "showReportId"],
    order: [["id", "ASC"]],
    raw: true,
    transaction,
  });
  return reports.map((r) =>
    toReport(r, {
      faults: faults.filter((f) => f.showReportId === r.id),
      items: items.filter((i) => i.showReportId === r.id),
      noteIds: notes.filter((n) => n.showReportId === r.id).map((n) => n.id),
    }),
  );
}

export async function getShowReports({ productionId }: { productionId: number }): Promise<ShowReportDto[]> {
  const reports = await getDb().ShowReport.findAll({
    where: { productionId },
    order: [
      ["performedOn", "DESC"],
      ["id", "DESC"],
    ],
  });
  return readReports(productionId, reports);
}

async function oneReport(productionId: number, report: ShowReport, transaction: Transaction) {
  return (await readReports(productionId, [report], transaction))[0];
}

/** Every unit and subject the report names must be this production's: a 400 names each bad entry. */
async function checkParts(productionId: number, parts: Partial<ShowReportContent>, transaction: Transaction) {
  const faultUnits = (parts.faults ?? []).map((f) => f.fixtureId).filter((id): id is number => id != null);
  const known = faultUnits.length
    ? await getDb().Fixture.findAll({
        where: { productionId, id: faultUnits },
        attributes: ["id"],
        raw: true,
        transaction,
      })
    : [];
  const missing = (parts.faults ?? [])
    .map((f, i) => [f, i] as const)
    .filter(([f]) => f.fixtureId != null && !known.some((x) => x.id === f.fixtureId));
  if (missing.length) {
    throw new AppError("bad_request", `Fixture ${missing[0][0].fixtureId} is not in this production.`, {
      fieldErrors: Object.fromEntries(missing.map(([, i]) => [`faults.${i}.fixtureId`, ["no such fixture"]])),
    });
  }
  for (const [i, item] of (parts.items ?? []).entries())
    await checkSubject(productionId, item.subject, item.subjectId ?? null, transaction, `items.${i}.subjectId`);
}

/** Replaces the report's items and/or fault log with the lists given (a list not given is kept). */
async function writeParts(reportId: number, parts: Partial<ShowReportContent>, transaction: Transaction) {
  const { ShowReportFault } = getDb();
  if (parts.items) {
    await reportItems().destroy({ where: { showReportId: reportId }, transaction });
    for (const [i, item] of parts.items.entries())
      await reportItems().create(
        {
          showReportId: reportId,
          sortOrder: i,
          body: item.body,
          kind: item.kind,
          subject: item.subject,
          subjectId: item.subject === "production" ? null : (item.subjectId ?? null),
          priority: item.priority ?? null,
          ownerId: item.ownerId ?? null,
        },
        { transaction },
      );
  }
  if (parts.faults) {
    await ShowReportFault.destroy({ where: { showReportId: reportId }, transaction });
    for (const f of parts.faults)
      await ShowReportFault.create(
        { showReportId: reportId, fixtureId: f.fixtureId, kind: f.kind, description: f.description },
        { transaction },
      );
  }
}

async function sendContext(productionId: number, userId: number): Promise<SendContext> {
  const [team, running] = [await getTeamByProduction({ productionId }), await getCurrentCue({ productionId })];
  return { productionId, userId, team, running };
}

/** A new report, sent at once (its notes written) unless `send` is false. */
export async function fileShowReport({
  productionId,
  userId,
  input,
}: {
  productionId: number;
  userId: number;
  input: ShowReportInput;
}): Promise<{ report: ShowReportDto; notes: NoteDto[] }> {
  const { send = true, ...content } = input;
  const ctx = await sendContext(productionId, userId);
  return inTransaction(async (transaction) => {
    await checkParts(productionId, content, transaction);
    const report = await getDb().ShowReport.create(
      {
        productionId,
        performance: content.performance,
        performedOn: content.performedOn,
        summary: content.summary,
        authorId: userId,
        sentAt: null,
        sentBy: null,
      },
      { transaction },
    );
    await writeParts(report.id, content, transaction);
    const notes = send ? await sendDraft(transaction, report, ctx) : [];
    const dto = await oneReport(productionId, report, transaction);
    await recordChange(
      { productionId, userId, entity: "showReport", entityId: report.id, action: "create", after: dto },
      transaction,
    );
    return { report: dto, notes };
  });
}

/** The report, locked for this transaction, if it is still a draft at the version the client read. */
async function lockDraft(productionId: number, id: number, version: number, transaction: Transaction) {
  const report = await getDb().ShowReport.findOne({ where: { productionId, id }, transaction, lock: true });
  if (!report) throw notFound("Show report");
  if (report.sentAt) {
    throw new AppError(
      "conflict",
      `This report went to the team on ${report.sentAt.toISOString().slice(0, 10)}; a sent report stays as it was sent. Write a note or a new report instead.`,
      { current: await oneReport(productionId, report, transaction) },
    );
  }
  if (report.version !== version) {
    throw new AppError("conflict", "Someone else changed this show report first. Here is the current version.", {
      current: await oneReport(productionId, report, transaction),
    });
  }
  return report;
}

/** Changes a draft: its words, date, items or fault log (lists replace the stored ones). */
export async function updateShowReport({
  productionId,
  id,
  userId,
  patch,
}: {
  productionId: number;
  id: number;
  userId: number;
  patch: UpdateShowReportPatch;
}): Promise<ShowReportDto> {
  const { version, items, faults, ...fields } = patch;
  return inTransaction(async (transaction) => {
    const report = await lockDraft(productionId, id, version, transaction);
    await checkParts(productionId, { items, faults }, transaction);
    const before = await oneReport(productionId, report, transaction);
    await report.update({ ...fields, version: report.version + 1 }, { transaction });
    await writeParts(report.id, { items, faults }, transaction);
    const after = await oneReport(productionId, report, transaction);
    await recordChange(
      { productionId, userId, entity: "showReport", entityId: id, action: "update", before, after },
      transaction,
    );
    return after;
  });
}

/** Sends a draft: its notes are written and it becomes read-only. */
export async function sendShowReport({
  productionId,
  id,
  userId,
  version,
}: {
  productionId: number;
  id: number;
  userId: number;
  version: number;
}): Promise<{ report: ShowReportDto; notes: NoteDto[] }> {
  const ctx = await sendContext(productionId, userId);
  return inTransaction(async (transaction) => {
    const report = await lockDraft(productionId, id, version, transaction);
    const before = await oneReport(productionId, report, transaction);
    const notes = await sendDraft(transaction, report, ctx);
    const after = await oneReport(productionId, report, transaction);
    await recordChange(
      { productionId, userId, entity: "showReport", entityId: id, action: "update", before, after },
      transaction,
    );
    return { report: after, notes };
  });
}
