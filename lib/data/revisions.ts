import "server-only";
// Issued revisions: issue one (snapshot + what changed since the previous, in one transaction), list them,
// read one's snapshot, compare any two (or one with the paperwork as it stands), and the latest one's stamp
// for the prints.
import { QueryTypes, type Transaction } from "sequelize";
import { getDb } from "@/models";
import { AppError, notFound } from "@/lib/errors";
import { changedIds, diffSnapshots, summarise } from "@/lib/revisions/diff";
import { nextLetter } from "@/lib/revisions/letters";
import type { IssueRevisionInput } from "@/lib/revisions/schemas";
import type { RevisionDiff, RevisionDto, RevisionStamp, Snapshot } from "@/lib/revisions/types";
import { iso } from "./plain";
import { inTransaction } from "./transaction";
import { takeSnapshot } from "./revision-snapshot";

type Row = {
  id: number;
  productionId: number;
  sequence: number;
  label: string;
  issuedFor: RevisionDto["issuedFor"];
  note: string | null;
  issuedBy: string | null;
  createdAt: Date | string;
  summary: string;
};

const SELECT = `SELECT r.id, r.production_id AS productionId, r.sequence, r.label, r.issued_for AS issuedFor, r.note,
  u.name AS issuedBy, r.created_at AS createdAt, r.summary
  FROM revisions r LEFT JOIN users u ON u.id = r.issued_by_user_id`;

const toDto = (r: Row): RevisionDto => ({
  id: r.id,
  productionId: r.productionId,
  sequence: r.sequence,
  label: r.label,
  issuedFor: r.issuedFor,
  note: r.note,
  issuedBy: r.issuedBy,
  issuedAt: iso(r.createdAt)!,
  summary: JSON.parse(r.summary),
});

/** Every revision of a production, newest first. */
export async function getRevisionsByProduction({ productionId }: { productionId: number }): Promise<RevisionDto[]> {
  const rows = await getDb().sequelize.query<Row>(`${SELECT} WHERE r.production_id = ? ORDER BY r.sequence DESC`, {
    replacements: [productionId],
    type: QueryTypes.SELECT,
  });
  return rows.map(toDto);
}

export async function getRevisionById({
  productionId,
  revisionId,
}: {
  productionId: number;
  revisionId: number;
}): Promise<RevisionDto | null> {
  const [row] = await getDb().sequelize.query<Row>(`${SELECT} WHERE r.production_id = ? AND r.id = ?`, {
    replacements: [productionId, revisionId],
    type: QueryTypes.SELECT,
  });
  return row ? toDto(row) : null;
}

/** The latest issued revision's label, purpose and date: the one stamp every print carries. */
export async function getLatestRevisionStamp({
  productionId,
}: {
  productionId: number;
}): Promise<RevisionStamp | null> {
  const [row] = await getDb().sequelize.query<{
    label: string;
    issuedFor: RevisionStamp["issuedFor"];
    createdAt: Date;
  }>(
    "SELECT label, issued_for AS issuedFor, created_at AS createdAt FROM revisions WHERE production_id = ? ORDER BY sequence DESC LIMIT 1",
    { replacements: [productionId], type: QueryTypes.SELECT },
  );
  return row ? { label: row.label, issuedFor: row.issuedFor, issuedAt: iso(row.createdAt)! } : null;
}

async function readSnapshot(where: string, replacements: unknown[], transaction?: Transaction) {
  const [row] = await getDb().sequelize.query<{ id: number; label: string; snapshot: string }>(
    `SELECT id, label, snapshot FROM revisions WHERE ${where} LIMIT 1`,
    { replacements, type: QueryTypes.SELECT, transaction },
  );
  return row ? { id: row.id, label: row.label, snapshot: JSON.parse(row.snapshot) as Snapshot } : null;
}

/** One revision's snapshot, or the paperwork as it stands for "current". */
export async function getSnapshot({
  productionId,
  revision,
}: {
  productionId: number;
  revision: number | "current";
}): Promise<{ label: string; snapshot: Snapshot }> {
  if (revision === "current") return { label: "current", snapshot: await takeSnapshot({ productionId }) };
  const found = await readSnapshot("production_id = ? AND id = ?", [productionId, revision]);
  if (!found) throw notFound("Revision");
  return found;
}

/** What changed from one revision (or "current") to another. */
export async function compareRevisions({
  productionId,
  from,
  to,
}: {
  productionId: number;
  from: number | "current";
  to: number | "current";
}): Promise<{ from: string; to: string; diff: RevisionDiff }> {
  const a = await getSnapshot({ productionId, revision: from });
  const b = await getSnapshot({ productionId, revision: to });
  return { from: a.label, to: b.label, diff: diffSnapshots(a.snapshot, b.snapshot) };
}

/**
 * The fixtures and cues that differ from the latest issued revision: the views' "changed since" marker.
 * Null when nothing has been issued yet (there is nothing to be changed since).
 */
export async function getChangedSinceLatest({
  productionId,
}: {
  productionId: number;
}): Promise<{ label: string; fixtureIds: number[]; cueIds: number[] } | null> {
  const latest = await readSnapshot("production_id = ? ORDER BY sequence DESC", [productionId]);
  if (!latest) return null;
  const now = await takeSnapshot({ productionId });
  return { label: latest.label, ...changedIds(diffSnapshots(latest.snapshot, now)) };
}

/**
 * Issues a revision: the production row is locked first, so two people issuing at once get A and B, not
 * two A's; the snapshot and the comparison with the previous revision are taken under that lock.
 */
export async function issueRevision({
  productionId,
  userId,
  input,
}: {
  productionId: number;
  userId: number;
  input: IssueRevisionInput;
}): Promise<{
  revision: RevisionDto;
  diff: RevisionDiff;
  snapshot: Snapshot;
  previous: { id: number; label: string } | null;
}> {
  const { sequelize, Revision } = getDb();
  const issued = await inTransaction(async (transaction) => {
    const [locked] = await sequelize.query("SELECT id FROM productions WHERE id = ? FOR UPDATE", {
      replacements: [productionId],
      type: QueryTypes.SELECT,
      transaction,
    });
    if (!locked) throw notFound("Production");
    const labels = await sequelize.query<{ label: string; sequence: number }>(
      "SELECT label, sequence FROM revisions WHERE production_id = ?",
      { replacements: [productionId], type: QueryTypes.SELECT, transaction },
    );
    const label = input.label?.trim() || nextLetter(labels.map((l) => l.label));
    if (labels.some((l) => l.label.toLowerCase() === label.toLowerCase()))
      throw new AppError("bad_request", `Revision ${label} has already been issued; choose another label.`, {
        fieldErrors: { label: [`${label} is already used`] },
      });
    const previous = await readSnapshot("production_id = ? ORDER BY sequence DESC", [productionId], transaction);
    const snapshot = await takeSnapshot({ productionId, transaction });
    const diff = diffSnapshots(previous?.snapshot ?? null, snapshot);
    const row = await Revision.create(
      {
        productionId,
        sequence: Math.max(0, ...labels.map((l) => l.sequence)) + 1,
        label,
        issuedFor: input.issuedFor,
        note: input.note?.trim() || null,
        issuedByUserId: userId,
        snapshot: JSON.stringify(snapshot),
        summary: JSON.stringify(summarise(diff)),
      },
      { transaction },
    );
    return { id: row.id, diff, snapshot, previous: previous ? { id: previous.id, label: previous.label } : null };
  });
  const revision = await getRevisionById({ productionId, revisionId: issued.id });
  return { revision: revision!, diff: issued.diff, snapshot: issued.snapshot, previous: issued.previous };
}

/** The revision issued just before this one, if any. */
export async function getPreviousRevisionId({
  productionId,
  revisionId,
}: {
  productionId: number;
  revisionId: number;
}): Promise<number | null> {
  const [row] = await getDb().sequelize.query<{ id: number }>(
    `SELECT p.id FROM revisions r JOIN revisions p ON p.production_id = r.production_id AND p.sequence < r.sequence
      WHERE r.production_id = ? AND r.id = ? ORDER BY p.sequence DESC LIMIT 1`,
    { replacements: [productionId, revisionId], type: QueryTypes.SELECT },
  );
  return row?.id ?? null;
}

/** The current version of every fixture and cue, for restore buttons that send the version the page showed. */
export async function getRowVersions({
  productionId,
}: {
  productionId: number;
}): Promise<{ fixtures: Record<number, number>; cues: Record<number, number> }> {
  const { sequelize } = getDb();
  const read = (table: string) =>
    sequelize.query<{ id: number; version: number }>(`SELECT id, version FROM ${table} WHERE production_id = ?`, {
      replacements: [productionId],
      type: QueryTypes.SELECT,
    });
  const toMap = (rows: Array<{ id: number; version: number }>) =>
    Object.fromEntries(rows.map((r) => [r.id, r.version]));
  return { fixtures: toMap(await read("fixtures")), cues: toMap(await read("cues")) };
}

/** The answer of GET …/revisions/latest: the stamp and the fixtures and cues changed since it. */
export async function getLatestRevisionMarks({ productionId }: { productionId: number }) {
  const latest = await getLatestRevisionStamp({ productionId });
  const changed = latest ? await getChangedSinceLatest({ productionId }) : null;
  return { latest, fixtureIds: changed?.fixtureIds ?? [], cueIds: changed?.cueIds ?? [] };
}
