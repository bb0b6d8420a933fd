import "server-only";
// The stage manager's show report: one transaction writes the report, its lamp-out and fault log, and a note
// for each lighting item (owned by the right person) and for each logged fault on a unit (a work note).
import { getDb, type ShowReport, type ShowReportFault } from "@/models";
import { AppError } from "@/lib/errors";
import type { ShowReportInput } from "@/lib/notes/schemas";
import type { NoteDto, ShowReportDto, ShowReportFaultDto } from "@/lib/notes/dto";
import { defaultOwner } from "@/lib/notes/routing";
import { getTeamByProduction } from "./memberships";
import { getCurrentCue, insertNote, toNoteDto } from "./notes";
import { plain } from "./plain";
import { recordChange } from "./changes";
import { inTransaction } from "./transaction";

const toFault = (f: ShowReportFault): ShowReportFaultDto => plain(f, ["id", "fixtureId", "kind", "description"]);
const toReport = (r: ShowReport, faults: ShowReportFault[], noteIds: number[]): ShowReportDto => ({
  ...plain(r, ["id", "performance", "performedOn", "summary", "authorId", "version", "createdAt"]),
  faults: faults.map(toFault),
  noteIds,
});

export async function getShowReports({ productionId }: { productionId: number }): Promise<ShowReportDto[]> {
  const { ShowReport, ShowReportFault, Note } = getDb();
  const reports = await ShowReport.findAll({
    where: { productionId },
    order: [
      ["performedOn", "DESC"],
      ["id", "DESC"],
    ],
  });
  const ids = reports.map((r) => r.id);
  const [faults, notes] = ids.length
    ? await Promise.all([
        ShowReportFault.findAll({ where: { showReportId: ids }, order: [["id", "ASC"]] }),
        Note.findAll({ where: { productionId, showReportId: ids }, attributes: ["id", "showReportId"], raw: true }),
      ])
    : [[], []];
  return reports.map((r) =>
    toReport(
      r,
      faults.filter((f) => f.showReportId === r.id),
      notes.filter((n) => n.showReportId === r.id).map((n) => n.id),
    ),
  );
}

export async function fileShowReport({
  productionId,
  userId,
  input,
}: {
  productionId: number;
  userId: number;
  input: ShowReportInput;
}): Promise<{ report: ShowReportDto; notes: NoteDto[] }> {
  const { ShowReport, ShowReportFault, Fixture, Note } = getDb();
  const fixtureIds = [...new Set(input.faults.map((f) => f.fixtureId).filter((id): id is number => id != null))];
  const fixtures = fixtureIds.length
    ? await Fixture.findAll({
        where: { productionId, id: fixtureIds },
        attributes: ["id", "unitNumber", "channel"],
        raw: true,
      })
    : [];
  const missing = input.faults
    .map((f, i) => [f, i] as const)
    .filter(([f]) => f.fixtureId != null && !fixtures.some((x) => x.id === f.fixtureId));
  if (missing.length) {
    throw new AppError("bad_request", `Fixture ${missing[0][0].fixtureId} is not in this production.`, {
      fieldErrors: Object.fromEntries(missing.map(([, i]) => [`faults.${i}.fixtureId`, ["no such fixture"]])),
    });
  }
  const team = await getTeamByProduction({ productionId });
  const running = await getCurrentCue({ productionId });
  return inTransaction(async (transaction) => {
    const report = await ShowReport.create(
      {
        productionId,
        performance: input.performance,
        performedOn: input.performedOn,
        summary: input.summary,
        authorId: userId,
      },
      { transaction },
    );
    const faults: ShowReportFault[] = [];
    for (const f of input.faults)
      faults.push(
        await ShowReportFault.create(
          { showReportId: report.id, fixtureId: f.fixtureId, kind: f.kind, description: f.description },
          { transaction },
        ),
      );
    const notes: NoteDto[] = [];
    const base = {
      productionId,
      authorId: userId,
      origin: "show_report" as const,
      showReportId: report.id,
      runningCueId: running.cueId,
      runningCueNumber: running.number,
      dueDate: null,
      closedBy: null,
      closedAt: null,
    };
    for (const item of input.items) {
      // Subjects and owners are checked the same way as any note's.
      const input = {
        ...item,
        subjectId: item.subjectId ?? null,
        ownerId: item.ownerId ?? defaultOwner(item.kind, team),
      };
      notes.push(
        await insertNote(transaction, { productionId, userId, input, origin: "show_report", showReportId: report.id }),
      );
    }
    for (const f of faults) {
      if (f.fixtureId == null) continue;
      const unit = fixtures.find((x) => x.id === f.fixtureId)!;
      const row = await Note.create(
        {
          ...base,
          subject: "fixture",
          subjectId: f.fixtureId,
          kind: "work",
          priority: "high",
          ownerId: defaultOwner("work", team),
          needsAccess: true,
          dueSession: "before the next performance",
          body: `${f.kind === "lamp_out" ? "Lamp out" : "Fault"} in ${input.performance} (unit ${unit.unitNumber}${unit.channel != null ? `, channel ${unit.channel}` : ""}): ${f.description}`,
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
    const dto = toReport(
      report,
      faults,
      notes.map((n) => n.id),
    );
    await recordChange(
      { productionId, userId, entity: "showReport", entityId: report.id, action: "create", after: dto },
      transaction,
    );
    return { report: dto, notes };
  });
}
