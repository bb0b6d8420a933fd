// Row-by-row validation of an imported table with zod: each mapped cell is read from text (lengths in
// any unit parseLength knows, yes/no words, whole numbers) and then checked by the same field schema
// the API uses, so a file cannot store what a form could not.
import { z } from "zod";
import { fixtureFieldsSchema } from "@/lib/validation/fixture";
import { parseAngle, parseLength } from "@/lib/optics";
import { FIELD_BY_KEY, headerUnit, type ColumnTarget, type ImportKey } from "./fields";
import { restoreCell } from "./neutralise";
import type { RawTable } from "./table";

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
      return text.pipe(z.string().min(1, { error: `${field.header} is empty` }).max(80, { error: `${field.header} is longer than 80 characters` }));
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

/** Validates every data row; errors name the row number and the file's own column header. */
export function validateRows(table: RawTable, mapping: ColumnTarget[], opts: { lengthUnit: LengthUnit }): { rows: ParsedRow[]; errors: RowError[] } {
  const columns = mapping.flatMap((key, index) => (key === "ignore" ? [] : [{ key, index, header: table.headers[index] }]));
  const shape: Record<string, z.ZodType> = {};
  for (const c of columns) shape[c.key] = cellSchema(c.key, headerUnit(c.header) ?? opts.lengthUnit, table.decimalComma);
  const rowSchema = z.object(shape);
  const headerOf = new Map(columns.map((c) => [c.key as string, c.header]));

  const rows: ParsedRow[] = [];
  const errors: RowError[] = [];
  const seen = new Map<string, number>();
  for (const raw of table.rows) {
    const input: Record<string, string> = {};
    for (const c of columns) input[c.key] = raw.cells[c.index] ?? "";
    const parsed = rowSchema.safeParse(input);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) errors.push({ row: raw.rowNumber, column: headerOf.get(String(issue.path[0])) ?? "(row)", message: issue.message });
      continue;
    }
    const values = parsed.data as RowValues;
    const key = `${String(values.position).toLowerCase()}|${String(values.unitNumber).toLowerCase()}`;
    const first = seen.get(key);
    if (first !== undefined) {
      errors.push({ row: raw.rowNumber, column: headerOf.get("unitNumber")!, message: `Unit ${values.unitNumber} on ${values.position} is already in row ${first}` });
      continue;
    }
    seen.set(key, raw.rowNumber);
    rows.push({ rowNumber: raw.rowNumber, values });
  }
  return { rows, errors };
}

/** The columns a file must map before any row can be read. */
export function missingRequiredColumns(mapping: ColumnTarget[]): string[] {
  const need: Array<[ImportKey, string]> = [["position", "Position"], ["unitNumber", "Unit"]];
  return need.filter(([k]) => !mapping.includes(k)).map(([, label]) => label);
}
