import "server-only";
// The lists a notes screen names subjects and people from: the team, positions, fixtures, cues, focus points.
import { getDb } from "@/models";
import type { NoteSubjects } from "@/lib/notes/subjects";
import { compareUnitNumbers } from "@/lib/rig/unit-number";
import { getTeamByProduction } from "./memberships";

export async function getNoteSubjects({ productionId }: { productionId: number }): Promise<NoteSubjects> {
  const { Position, Fixture, Cue, FocusPoint } = getDb();
  const [team, positions, fixtures, cues, points] = await Promise.all([
    getTeamByProduction({ productionId }),
    Position.findAll({
      where: { productionId },
      attributes: ["id", "name", "sortOrder"],
      order: [
        ["sortOrder", "ASC"],
        ["name", "ASC"],
      ],
      raw: true,
    }),
    Fixture.findAll({ where: { productionId }, attributes: ["id", "positionId", "unitNumber", "channel"], raw: true }),
    Cue.findAll({
      where: { productionId },
      attributes: ["id", "number", "label"],
      order: [["number", "ASC"]],
      raw: true,
    }),
    FocusPoint.findAll({ where: { productionId }, attributes: ["id", "name"], order: [["name", "ASC"]], raw: true }),
  ]);
  const posName = new Map(positions.map((p) => [p.id, p.name]));
  const posRank = new Map(positions.map((p, i) => [p.id, i]));
  const sortedFixtures = [...fixtures].sort(
    (a, b) =>
      (posRank.get(a.positionId) ?? 0) - (posRank.get(b.positionId) ?? 0) ||
      compareUnitNumbers(a.unitNumber, b.unitNumber),
  );
  return {
    people: team.map((m) => ({ userId: m.userId, name: m.name })),
    position: positions.map((p) => ({ id: p.id, label: p.name })),
    fixture: sortedFixtures.map((f) => ({
      id: f.id,
      label: `${posName.get(f.positionId) ?? "?"} unit ${f.unitNumber}${f.channel != null ? ` (ch ${f.channel})` : ""}`,
    })),
    cue: cues.map((c) => ({ id: c.id, label: `${Number(c.number)}${c.label ? ` ${c.label}` : ""}` })),
    focus_point: points.map((p) => ({ id: p.id, label: p.name })),
  };
}
