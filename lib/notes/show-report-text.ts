// The words of a show report's e-mail: plain text, readable on a phone.
import type { NoteDto, ShowReportDto } from "./dto";
import { KIND_LABELS } from "./words";

export function showReportText(
  productionName: string,
  report: ShowReportDto,
  notes: NoteDto[],
): { subject: string; text: string } {
  const lines = [
    `Show report: ${productionName}, ${report.performance} (${report.performedOn})`,
    "",
    report.summary || "No summary written.",
    "",
    report.faults.length ? "Lamp-out and fault log:" : "No lamps out or faults logged.",
    ...report.faults.map((f) => `- ${f.kind === "lamp_out" ? "Lamp out" : "Fault"}: ${f.description}`),
    "",
    notes.length ? "Notes written from this report:" : "No lighting notes.",
    ...notes.map((n) => `- [${KIND_LABELS[n.kind]}] ${n.body}`),
  ];
  return { subject: `Show report: ${productionName}, ${report.performance}`, text: lines.join("\n") };
}
