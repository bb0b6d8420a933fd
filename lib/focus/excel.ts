// The focus data as an Excel workbook, one row a fixture with every value of its chart, for crews that
// keep their own sheets.
import ExcelJS from "exceljs";
import type { FocusChart } from "./chart-model";

/**
 * OWASP "CSV Injection": a cell that begins with = + - @ tab or carriage return may run as a formula when
 * opened in a spreadsheet; prefixing a single quote makes it plain text.
 */
export function neutraliseCell(value: string): string {
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

export type SheetColumn = { header: string; key: string; width: number };

/** Every row key the charts use, in first-seen order: beam rows differ by family, so one chart is not enough. */
export function focusColumns(charts: FocusChart[]): SheetColumn[] {
  const seen = new Map<string, string>();
  for (const c of charts)
    for (const r of [...c.identity, ...c.focus, ...c.beam]) if (!seen.has(r.key)) seen.set(r.key, r.label);
  const fromRows = [...seen].map(([key, header]) => ({
    header,
    key,
    width: key === "channel" || key === "unit" ? 8 : 24,
  }));
  return [
    ...fromRows,
    { header: "Cuts", key: "cuts", width: 50 },
    { header: "Designer notes", key: "notes", width: 36 },
    { header: "As-focused notes", key: "focusNotes", width: 36 },
    { header: "Status", key: "status", width: 30 },
    { header: "Focus photo", key: "photo", width: 14 },
  ];
}

/** One plain object a chart, keyed like focusColumns; every text value neutralised. */
export function focusRow(c: FocusChart): Record<string, string | number> {
  const out: Record<string, string | number> = {};
  for (const r of [...c.identity, ...c.focus, ...c.beam]) out[r.key] = neutraliseCell(r.value);
  if (c.channel != null) out.channel = c.channel;
  out.cuts = neutraliseCell(c.cuts.map((x) => `${x.words} (${x.cutterWords})`).join("; "));
  out.notes = neutraliseCell(c.notes ?? "");
  out.focusNotes = neutraliseCell(c.focusNotes ?? "");
  out.status = neutraliseCell(c.focusedLine);
  // The picture stays in Throwline (a sheet a row per fixture has no room for it); the cell says one exists.
  out.photo = c.photo ? "taken" : "";
  return out;
}

export async function focusWorkbook(charts: FocusChart[], o: { productionName: string }): Promise<Buffer> {
  const wb = new ExcelJS.Workbook();
  wb.creator = "Throwline";
  const ws = wb.addWorksheet("Focus charts", { views: [{ state: "frozen", ySplit: 1 }] });
  ws.columns = focusColumns(charts);
  ws.getRow(1).font = { bold: true };
  for (const c of charts) ws.addRow(focusRow(c));
  ws.headerFooter.oddHeader = neutraliseCell(o.productionName);
  return Buffer.from(await wb.xlsx.writeBuffer());
}
