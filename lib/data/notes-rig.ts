import "server-only";
// The notes that walk the rig: the work call, the channel check that turns each fault into a work note,
// and "what lights this spot?" which ranks the units reaching a point in a cue.
import { getDb } from "@/models";
import { AppError } from "@/lib/errors";
import { orderWorkCall, type WorkCallFixture, type WorkCallPosition, type WorkCallStop } from "@/lib/notes/work-call";
import { rankSpotContributions, type SpotContribution } from "@/lib/notes/spot";
import type { ChannelCheckInput } from "@/lib/notes/schemas";
import type { NoteDto } from "@/lib/notes/dto";
import { studyLights } from "@/lib/studies/lights";
import { getColourList, getStudyFixtures, getStudyLevels, getStudyProduction } from "./studies";
import { recordChange } from "./changes";
import { inTransaction } from "./transaction";
import { toNoteDto, getCurrentCue } from "./notes";

async function rigPlaces(
  productionId: number,
): Promise<{ positions: WorkCallPosition[]; fixtures: WorkCallFixture[] }> {
  const { Position, Fixture } = getDb();
  const [positions, fixtures] = await Promise.all([
    Position.findAll({
      where: { productionId },
      attributes: ["id", "name", "x1", "y1", "x2", "y2", "trimHeight", "sortOrder"],
      raw: true,
    }),
    Fixture.findAll({
      where: { productionId },
      attributes: ["id", "positionId", "unitNumber", "channel", "x", "y", "lensHeight"],
      raw: true,
    }),
  ]);
  return { positions: positions as WorkCallPosition[], fixtures: fixtures as WorkCallFixture[] };
}

/** Open work notes in the order the crew walks the rig. */
export async function getWorkCall({ productionId }: { productionId: number }): Promise<WorkCallStop[]> {
  const rows = await getDb().Note.findAll({
    where: { productionId, kind: "work", status: ["open", "in_progress"] },
    order: [["id", "ASC"]],
  });
  const { positions, fixtures } = await rigPlaces(productionId);
  return orderWorkCall(rows.map(toNoteDto), positions, fixtures);
}

function faultText(f: WorkCallFixture, positionName: string, fault: string | undefined): string {
  const where = `${positionName} unit ${f.unitNumber}${f.channel != null ? ` (channel ${f.channel})` : ""}`;
  return `Channel check: ${where} faulty${fault ? `: ${fault}` : ""}.`;
}

/**
 * One tap per fixture: good ones are only counted; each faulty one becomes an open work note on that fixture
 * (needing access, as a fault is fixed at the unit). Every fixture must be this production's; all notes are
 * written in one transaction or none.
 */
export async function recordChannelCheck({
  productionId,
  userId,
  input,
}: {
  productionId: number;
  userId: number;
  input: ChannelCheckInput;
}): Promise<{ good: number; faulty: number; notes: NoteDto[] }> {
  const { positions, fixtures } = await rigPlaces(productionId);
  const byId = new Map(fixtures.map((f) => [f.id, f]));
  const posName = new Map(positions.map((p) => [p.id, p.name]));
  const unknown = input.results.map((r, i) => [r, i] as const).filter(([r]) => !byId.has(r.fixtureId));
  if (unknown.length) {
    throw new AppError("bad_request", `Fixture ${unknown[0][0].fixtureId} is not in this production.`, {
      fieldErrors: Object.fromEntries(unknown.map(([, i]) => [`results.${i}.fixtureId`, ["no such fixture"]])),
    });
  }
  if (input.ownerId != null) {
    const owner = await getDb().Membership.findOne({ where: { productionId, userId: input.ownerId } });
    if (!owner)
      throw new AppError("bad_request", "The owner must be a member of this production.", {
        fieldErrors: { ownerId: ["not a member of this production"] },
      });
  }
  const running = await getCurrentCue({ productionId });
  const faults = input.results.filter((r) => r.result === "faulty");
  const notes = await inTransaction(async (transaction) => {
    const out: NoteDto[] = [];
    for (const r of faults) {
      const f = byId.get(r.fixtureId)!;
      const row = await getDb().Note.create(
        {
          productionId,
          subject: "fixture",
          subjectId: f.id,
          body: faultText(f, posName.get(f.positionId) ?? "?", r.fault),
          kind: "work",
          priority: "high",
          ownerId: input.ownerId ?? null,
          needsAccess: true,
          dueDate: null,
          dueSession: null,
          authorId: userId,
          runningCueId: running.cueId,
          runningCueNumber: running.number,
          origin: "channel_check",
          showReportId: null,
          closedBy: null,
          closedAt: null,
        },
        { transaction },
      );
      const dto = toNoteDto(row);
      await recordChange(
        { productionId, userId, entity: "note", entityId: row.id, action: "create", after: dto },
        transaction,
      );
      out.push(dto);
    }
    return out;
  });
  return { good: input.results.length - faults.length, faulty: faults.length, notes };
}

/** The units reaching a point on the plan (at show-deck height) in a cue, or the current cue when none is given. */
export async function getSpotContributions({
  productionId,
  x,
  y,
  cueId,
}: {
  productionId: number;
  x: number;
  y: number;
  cueId?: number;
}): Promise<{
  cueId: number | null;
  stateLabel: string;
  total: number;
  contributions: SpotContribution[];
  warnings: string[];
}> {
  const chosen = cueId ?? (await getCurrentCue({ productionId })).cueId;
  if (chosen == null)
    throw new AppError("bad_request", "Choose a cue (no current cue is set).", {
      fieldErrors: { cueId: ["choose a cue"] },
    });
  const [production, fixtures, state, colours] = await Promise.all([
    getStudyProduction({ productionId }),
    getStudyFixtures({ productionId }),
    getStudyLevels({ productionId, source: { kind: "cue", cueId: chosen } }),
    getColourList({ productionId }),
  ]);
  const { lights, beams, warnings } = studyLights(fixtures, state.levels, {
    headHeight: production.headHeight,
    deckHeight: production.showDeckHeight,
    colours,
  });
  const sources = lights.map((l, i) => ({
    fixtureId: l.fixtureId,
    label: l.unitLabel,
    channel: l.channel,
    beam: beams[i],
  }));
  const ranked = rankSpotContributions({ x, y, z: production.showDeckHeight }, sources);
  return { cueId: chosen, stateLabel: state.label, ...ranked, warnings };
}
