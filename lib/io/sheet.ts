// What the writers take: named sheets of typed cells with a header row. Text cells are neutralised
// (OWASP CSV injection) by the writers, never by the callers.
export type CellOut = string | number | boolean | null;
export type SheetColumn = { header: string; width: number };
export type SheetOut = { name: string; columns: SheetColumn[]; rows: CellOut[][] };
