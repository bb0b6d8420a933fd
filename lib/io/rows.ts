// Row-by-row validation of an imported table with zod: each mapped cell is read from text (lengths in
// any unit parseLength knows, yes/no words, whole numbers) and then checked by the same field schema
// the API uses, so a file cannot store what a form could not.
import { z } from "zod";
import { fixtureFieldsSchema } from "@/lib/validation/fixture";
import { parseAngle, parseLength } from "@/lib/optics";
import { FIELD_BY_KEY, headerUnit, type ColumnTarget, type ImportKey } from "./fields";
import { restoreCell } from "./neutralise";
import type { RawTable } from "./raw-table";

export type LengthUnit = "m" | "ft";
export type RowValues = Partial<Record<ImportKey, string | number | boolean | null>>;
export type ParsedRow = { rowNumber: number; values: RowValues };
export type RowError = { row: number; column: string; message: string };

const TRUE_WORDS = new Set(["yes", "y", "true", "1", "x", "✓", "✔", "done"]);
const FALSE_WORDS = new Set(["", "no", "n", "false", "0", "-", "not yet"]);

function readNumber(text: string, decimalComma: boolean): number {
  const t = decimalComma ? text.replace(/^(-?\d+),(\d+)$/, "$1.$2") : text;
  return /^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(t) ? Number(t) : NaN;
}

type Ctx = z.RefinementCtx;
const fail = (ctx: Ctx, message: string) => {
  ctx.addIssue({ code: "custom", message });
  return z.NEVER;
};

function cellSchema(key: ImportKey, unit: LengthUnit, decimalComma: boolean): z.ZodType<unknown, string> {
  const field = FIELD_BY_KEY.get(key)!;
  // The API's own field schemas; typed loosely here because the key is chosen at run time.
  const shape = fixtureFieldsSchema.shape as unknown as Record<string, z.ZodType<unknown, any>>;
  const text = z.string().transform((s) => restoreCell(s).trim());
  switch (field.kind) {
    case "name":
      return text.pipe(
        z
          .string()
          .min(1, { error: `${field.header} is empty` })
          .max(80, { error: `${field.header} is longer than 80 characters` }),
      );
    case "optionalName":
      return text.transform((s) => s || null).pipe(z.string().max(60).nullable());
    case "unit":
      return text.pipe(z.string().min(1, { error: "Unit number is empty" })).pipe(shape.unitNumber);
    case "text":
      return text.transform((s) => s || null).pipe(shape[key]);
    case "int":
    case "number":
      return text
        .transform((s, ctx) => {
          if (s === "") return null;
          const n = readNumber(s, decimalComma);
          if (Number.isNaN(n)) return fail(ctx, `"${s}" is not a number`);
          if (field.kind === "int" && !Number.isInteger(n)) return fail(ctx, `"${s}" is not a whole number`);
          return n;
        })
        .pipe(shape[key]);
    case "length":
      return text
        .transform((s, ctx) => {
          if (s === "") return key === "x" || key === "y" ? undefined : null;
          try {
            return parseLength(decimalComma ? s.replace(/^(-?\d+),(\d+)/, "$1.$2") : s, unit);
          } catch (err) {
            return fail(ctx, (err as Error).message);
          }
        })
        .pipe(key === "x" || key === "y" ? shape[key].optional() : shape[key]);
    case "angle":
      return text
        .transform((s, ctx) => {
          if (s === "") return null;
          try {
            return parseAngle(decimalComma ? s.replace(",", ".") : s);
          } catch (err) {
            return fail(ctx, (err as Error).message);
          }
        })
        .pipe(shape[key]);
    case "bool":
      return text.transform((s, ctx) => {
        const w = s.toLowerCase();
        if (TRUE_WORDS.has(w)) return true;
        if (FALSE_WORDS.has(w)) return false;
        return fail(ctx, `"${s}" is not yes or no`);
      });
    case "aim":
      return text.transform((s, ctx) => {
        const w = s.toLowerCase();
        if (w === "" || w === "deck" || w === "floor") return "deck";
        if (w === "head" || w === "head height") return "head";
        return fail(ctx, `"${s}" is not deck or head`);
      });
  }
}

type CellResult = { ok: true; value: unknown } | { ok: false; messages: string[] };
type Column = { key: ImportKey; index: number; header: string; check: (text: string) => CellResult };

// Each column's zod schema is built once; a cell's result depends only on its text, so results are
// remembered per column. Real rigs repeat positions, types, colours and yes/no on every row, so most
// cells are checked once per distinct text (the import's speed goal) with the very same rules.
const MEMO_LIMIT = 20_000;
function columnChecker(schema: z.ZodType<unknown, string>): (text: string) => CellResult {
  const memo = new Map<string, CellResult>();
  return (text) => {
    const hit = memo.get(text);
    if (hit) return hit;
    const parsed = schema.safeParse(text);
    const result: CellResult = parsed.success
      ? { ok: true, value: parsed.data }
      : { ok: false, messages: parsed.error.issues.map((i) => i.message) };
    if (memo.size < MEMO_LIMIT) memo.set(text, result);
    return result;
  };
}

/** Validates every data row; errors name the row number and the file's own column header. */
export function validateRows(
  table: RawTable,
  mapping: ColumnTarget[],
  opts: { lengthUnit: LengthUnit },
): { rows: ParsedRow[]; errors: RowError[] } {
  const checker = rowChecker(table, mapping, opts);
  checker.check(0, table.rows.length);
  return checker.result;
}

/** The same checks a slice at a time, so a caller can report progress (and let the event loop breathe) between slices. */
export function rowChecker(table: RawTable, mapping: ColumnTarget[], opts: { lengthUnit: LengthUnit }) {
  const columns: Column[] = mapping.flatMap((key, index) =>
    key === "ignore"
      ? []
      : [
          {
            key,
            index,
            header: table.headers[index],
            check: columnChecker(
              cellSchema(key, headerUnit(table.headers[index]) ?? opts.lengthUnit, table.decimalComma),
            ),
          },
        ],
  );
  const unitHeader = columns.find((c) => c.key === "unitNumber")?.header ?? "Unit";

  const rows: ParsedRow[] = [];
  const errors: RowError[] = [];
  const seen = new Map<string, number>();
  const checkRow = (raw: RawTable["rows"][number]) => {
    const values: RowValues = {};
    let bad = false;
    for (const c of columns) {
      const result = c.check(raw.cells[c.index] ?? "");
      if (!result.ok) {
        bad = true;
        for (const message of result.messages) errors.push({ row: raw.rowNumber, column: c.header, message });
      } else if (result.value !== undefined) values[c.key] = result.value as RowValues[ImportKey];
    }
    if (bad) return;
    const key = `${String(values.position).toLowerCase()}|${String(values.unitNumber).toLowerCase()}`;
    const first = seen.get(key);
    if (first !== undefined) {
      errors.push({
        row: raw.rowNumber,
        column: unitHeader,
        message: `Unit ${values.unitNumber} on ${values.position} is already in row ${first}`,
      });
      return;
    }
    seen.set(key, raw.rowNumber);
    rows.push({ rowNumber: raw.rowNumber, values });
  };
  return {
    check(from: number, to: number) {
      for (let i = from; i < Math.min(to, table.rows.length); i++) checkRow(table.rows[i]);
    },
    result: { rows, errors },
  };
}

/** The columns a file must map before any row can be read. */
export function missingRequiredColumns(mapping: ColumnTarget[]): string[] {
  const need: Array<[ImportKey, string]> = [
    ["position", "Position"],
    ["unitNumber", "Unit"],
  ];
  return need.filter(([k]) => !mapping.includes(k)).map(([, label]) => label);
}
