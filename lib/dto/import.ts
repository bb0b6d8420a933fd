// A rig import's check, as the import screen shows it before anything is written.
import type { ColumnTarget } from "@/lib/io/fields";
import type { LengthUnit, RowError } from "@/lib/io/rows";
import type { ImportPlanResult } from "@/lib/rig/import-plan";
import type { FixtureChange } from "@/lib/io/import-diff";

export type ImportPreview = {
  fileName: string;
  format: "csv" | "xlsx";
  sheet: string | null;
  sheetNames: string[];
  headers: string[];
  sample: string[][];
  mapping: ColumnTarget[];
  lengthUnit: LengthUnit;
  notes: string[];
  rowCount: number;
  /** At most a few hundred, in row order; errorCount says how many there were. */
  errors: RowError[];
  errorCount: number;
  counts: ImportPlanResult["counts"];
  newPositions: string[];
  newTypes: string[];
  /** Each fixture the import would change, with every changed field's old and new value (the first few hundred). */
  changes: FixtureChange[];
  changedTotal: number;
};
