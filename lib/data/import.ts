import "server-only";
import { getDb } from "@/models";
import { AppError } from "@/lib/errors";
import type { Member } from "@/lib/auth/policy";
import { readTable } from "@/lib/io/read-table";
import { FileProblem } from "@/lib/io/raw-table";
import { normaliseHeader, suggestMapping, type ColumnTarget } from "@/lib/io/fields";
import { missingRequiredColumns, rowChecker, type LengthUnit, type RowError } from "@/lib/io/rows";
import type { RawTable } from "@/lib/io/raw-table";
import { planImport, type ImportPlanResult, type Snapshot } from "@/lib/rig/import-plan";
import { importDiff } from "@/lib/io/import-diff";
import type { ImportPreview } from "@/lib/dto/import";
import type { DmxMode } from "@/lib/dto/fixture-type";
import { attributeOf } from "@/lib/rig/fixture-fields";
import { requireProduction } from "./productions";
import { jsonColumn } from "./json-column";
import { writeImport } from "./import-write";
import type { Progress } from "./import-progress";

export type ImportRequest = {
  bytes: Uint8Array;
  fileName: string;
  sheet?: string;
  mapping?: ColumnTarget[];
  lengthUnit?: LengthUnit;
  createMissing: boolean;
};
export type { Progress };

const MAX_ERRORS = 500;

// What planning reads of each existing fixture: its identity, version and DMX fields, and the fields
// the file's columns map to (the only ones it can compare or change); a rig of thousands of units
// then costs a fraction of reading every column.
const SNAPSHOT_BASE = ["id", "version", "positionId", "fixtureTypeId", "unitNumber", "address", "footprint"];

async function loadSnapshot(productionId: number, mapping: ColumnTarget[]): Promise<Snapshot> {
  const { Position, FixtureType, FocusPoint, Fixture } = getDb();
  const known = Fixture.getAttributes() as Record<string, unknown>;
  const mapped = mapping.filter((k) => k !== "ignore").map(attributeOf);
  const attributes = [...new Set([...SNAPSHOT_BASE, ...mapped])].filter((a) => a in known);
  const [positions, types, focusPoints, fixtures] = await Promise.all([
    Position.findAll({ where: { productionId }, raw: true }),
    FixtureType.findAll({ where: { productionId }, raw: true }),
    FocusPoint.findAll({ where: { productionId }, raw: true }),
    Fixture.findAll({ where: { productionId }, attributes, raw: true }),
  ]);
  const bools = ["hung", "focused"].filter((a) => attributes.includes(a));
  if (bools.length)
    for (const f of fixtures as unknown as Array<Record<string, unknown>>) for (const b of bools) f[b] = Boolean(f[b]);
  return {
    positions,
    types: types.map((t) => ({ ...t, dmxModes: jsonColumn<DmxMode[]>(t.dmxModes) })),
    focusPoints,
    fixtures: fixtures as unknown as Snapshot["fixtures"],
  };
}

export async function getRememberedMapping(productionId: number) {
  const row = await getDb().ImportMapping.findOne({ where: { productionId } });
  if (!row) return { columns: {} as Record<string, ColumnTarget>, lengthUnit: null };
  const columns = jsonColumn<Record<string, ColumnTarget>>(row.columns);
  return { columns: columns as Record<string, ColumnTarget>, lengthUnit: row.lengthUnit };
}

const SLICE = 2000;

// With a progress listener (the streamed reply) rows are checked a slice at a time, yielding between
// slices so each progress line goes out while the rest is checked; without one, in one go.
async function checkInSlices(table: RawTable, mapping: ColumnTarget[], lengthUnit: LengthUnit, progress?: Progress) {
  const checker = rowChecker(table, mapping, { lengthUnit });
  const total = table.rows.length;
  for (let from = 0; from < total; from += progress ? SLICE : total) {
    checker.check(from, progress ? from + SLICE : total);
    if (progress && from + SLICE < total) {
      progress("checking", from + SLICE, total);
      await new Promise((resolve) => setImmediate(resolve));
    }
  }
  return checker.result;
}

/** Reads, maps and checks a file against the rig; writes nothing. */
async function prepare(productionId: number, member: Member, req: ImportRequest, progress?: Progress) {
  const production = await requireProduction(productionId);
  progress?.("reading", 0, 1);
  const table = await readTable(req.bytes, req.fileName, { sheet: req.sheet }).catch((err) => {
    if (err instanceof FileProblem)
      throw new AppError("bad_request", err.message, { fieldErrors: { file: [err.message] } });
    throw err;
  });
  const remembered = await getRememberedMapping(productionId);
  if (req.mapping && req.mapping.length !== table.headers.length) {
    throw new AppError(
      "bad_request",
      `The mapping has ${req.mapping.length} entries but the file has ${table.headers.length} columns. Check the file again.`,
      { fieldErrors: { mapping: ["does not match the file's columns"] } },
    );
  }
  const mapping = req.mapping ?? suggestMapping(table.headers, remembered.columns);
  const lengthUnit: LengthUnit =
    req.lengthUnit ?? remembered.lengthUnit ?? (production.displayUnits === "imperial" ? "ft" : "m");
  const columnOf = (key: string) => table.headers[mapping.indexOf(key as ColumnTarget)] ?? key;

  let errors: RowError[] = [];
  let snapshot: Snapshot | null = null;
  let plan: ImportPlanResult = {
    plans: [],
    errors: [],
    newPositions: [],
    newTypes: [],
    counts: { create: 0, update: 0, unchanged: 0 },
  };
  const missing = missingRequiredColumns(mapping);
  if (missing.length) {
    errors = [
      {
        row: table.headerRowNumber,
        column: "(columns)",
        message: `No column is mapped to ${missing.join(" or ")}; every row needs them to find its fixture`,
      },
    ];
  } else {
    progress?.("checking", 0, table.rows.length);
    const checked = await checkInSlices(table, mapping, lengthUnit, progress);
    snapshot = await loadSnapshot(productionId, mapping);
    plan = planImport(checked.rows, snapshot, {
      member,
      createMissing: req.createMissing,
      columnOf,
    });
    errors = [...checked.errors, ...plan.errors].sort((a, b) => a.row - b.row);
    progress?.("checking", table.rows.length, table.rows.length);
  }
  const diff = snapshot ? importDiff(plan.plans, snapshot, production.displayUnits) : null;
  const preview: ImportPreview = {
    fileName: req.fileName,
    format: table.format,
    sheet: table.sheet ?? null,
    sheetNames: table.sheetNames ?? [],
    headers: table.headers,
    sample: table.rows.slice(0, 8).map((r) => r.cells),
    mapping,
    lengthUnit,
    notes: table.notes,
    rowCount: table.rows.length,
    errors: errors.slice(0, MAX_ERRORS),
    errorCount: errors.length,
    counts: plan.counts,
    newPositions: plan.newPositions,
    newTypes: plan.newTypes,
    changes: diff?.changed ?? [],
    changedTotal: diff?.changedTotal ?? 0,
  };
  return { preview, plan, table, mapping, lengthUnit };
}

export async function previewImport({
  productionId,
  member,
  request,
  progress,
}: {
  productionId: number;
  member: Member;
  request: ImportRequest;
  progress?: Progress;
}): Promise<ImportPreview> {
  return (await prepare(productionId, member, request, progress)).preview;
}

/** Checks everything first; writes only when every row is good, all in one transaction. */
export async function commitImport({
  productionId,
  member,
  userId,
  request,
  progress,
}: {
  productionId: number;
  member: Member;
  userId: number;
  request: ImportRequest;
  progress?: Progress;
}) {
  const { preview, plan, table, mapping, lengthUnit } = await prepare(productionId, member, request, progress);
  if (preview.errorCount) {
    const first = preview.errors[0];
    throw new AppError(
      "bad_request",
      `Nothing was imported: ${preview.errorCount} problem${preview.errorCount === 1 ? "" : "s"} to fix first (row ${first.row}, ${first.column}: ${first.message}).`,
      {
        fieldErrors: { rows: preview.errors.map((e) => `Row ${e.row}, ${e.column}: ${e.message}`) },
      },
    );
  }
  await writeImport({ productionId, userId, plan, progress });
  const columns = Object.fromEntries(table.headers.map((h, i) => [normaliseHeader(h), mapping[i]]));
  const { ImportMapping } = getDb();
  const saved = await ImportMapping.findOne({ where: { productionId } });
  if (saved) await saved.update({ columns, lengthUnit, version: saved.version + 1 });
  else await ImportMapping.create({ productionId, columns, lengthUnit });
  return { ...preview, committed: true as const };
}
