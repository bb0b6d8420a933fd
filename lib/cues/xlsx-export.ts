// The cue list as an Excel workbook: a "Cues" sheet (as the CSV), a "Parts" sheet (one row a part)
// and a "Levels" sheet with every channel's tracked level in every cue (channels down, cues across).
// Server only (exceljs).
import ExcelJS from "exceljs";
import { CUE_TABLE_COLUMNS, cueTableRows, neutralise, type CueTableRow } from "./table-export";
import { formatChannels } from "./keyboard-entry";
import { computeTracking } from "./tracking";
import { formatCueNumber } from "./cue-number";

export async function cuesToXlsx(opts: {
  title: string;
  rows: ReadonlyArray<CueTableRow & { id: number; levels: Record<number, number> }>;
}): Promise<Buffer> {
  const book = new ExcelJS.Workbook();
  book.creator = "Throwline";
  const sheet = book.addWorksheet("Cues", { views: [{ state: "frozen", ySplit: 1 }] });
  sheet.addRow([...CUE_TABLE_COLUMNS]).font = { bold: true };
  for (const r of cueTableRows(opts.rows)) sheet.addRow(r);
  sheet.columns.forEach((c, i) => (c.width = [8, 28, 8, 8, 8, 8, 8, 8, 7, 12, 48, 36, 40][i] ?? 12));

  // One row a part, so a spreadsheet can sort and filter them.
  const parts = book.addWorksheet("Parts", { views: [{ state: "frozen", ySplit: 1 }] });
  parts.addRow(["Cue", "Part", "Label", "Up (s)", "Down (s)", "Delay (s)", "Channels"]).font = { bold: true };
  for (const r of opts.rows)
    for (const p of r.parts)
      parts.addRow([
        formatCueNumber(r.number),
        p.part,
        neutralise(p.label),
        p.upTime,
        p.downTime ?? "",
        p.delay,
        formatChannels(p.channels),
      ]);
  parts.columns.forEach((c, i) => (c.width = [8, 6, 24, 8, 8, 8, 40][i] ?? 12));

  const show = computeTracking(opts.rows);
  const levels = book.addWorksheet("Levels", { views: [{ state: "frozen", xSplit: 1, ySplit: 1 }] });
  const byId = new Map(opts.rows.map((r) => [r.id, r]));
  levels.addRow(["Channel", ...show.cueIds.map((id) => formatCueNumber(byId.get(id)!.number))]).font = { bold: true };
  show.channels.forEach((ch, col) => levels.addRow([ch, ...show.states.map((s) => s[col])]));
  return Buffer.from(await book.xlsx.writeBuffer());
}
