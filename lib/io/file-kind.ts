// What kind of file arrived, judged by its bytes rather than its name: people rename files, and a
// spreadsheet saved "as .csv" by mistake should get a plain message, not a parser crash.

export const MAX_IMPORT_BYTES = 8 * 1024 * 1024;

export type Sniffed =
  | { kind: "csv"; text: string }
  | { kind: "xlsx"; bytes: Uint8Array }
  | { kind: "refused"; message: string };

const startsWith = (b: Uint8Array, sig: number[]) => sig.every((v, i) => b[i] === v);

/** Decides whether bytes are CSV text (UTF-8, BOM removed) or an .xlsx workbook; anything else is refused with a reason. */
export function sniffFile(bytes: Uint8Array, fileName = "", maxBytes = MAX_IMPORT_BYTES): Sniffed {
  if (bytes.byteLength === 0)
    return {
      kind: "refused",
      message: `${fileName || "The file"} is empty (0 bytes). Choose the file again, or export it once more.`,
    };
  if (bytes.byteLength > maxBytes) {
    return {
      kind: "refused",
      message: `${fileName || "The file"} is ${(bytes.byteLength / 1048576).toFixed(1)} MB; the limit is ${maxBytes / 1048576} MB. Split it, or remove columns you do not need.`,
    };
  }
  if (startsWith(bytes, [0x50, 0x4b, 0x03, 0x04])) return { kind: "xlsx", bytes };
  if (startsWith(bytes, [0xd0, 0xcf, 0x11, 0xe0])) {
    return {
      kind: "refused",
      message:
        "This is an old-style .xls workbook (or another legacy Office file). Save it as .xlsx or CSV and import that.",
    };
  }
  if (startsWith(bytes, [0x25, 0x50, 0x44, 0x46]))
    return { kind: "refused", message: "This is a PDF, not a table. Import a CSV or .xlsx file." };
  if (startsWith(bytes, [0xff, 0xfe]) || startsWith(bytes, [0xfe, 0xff])) {
    return { kind: "refused", message: "This text is saved as UTF-16. Save it as CSV in UTF-8 and import again." };
  }
  const probe = bytes.subarray(0, 64 * 1024);
  let control = 0;
  for (const b of probe) {
    if (b === 0)
      return {
        kind: "refused",
        message: `${fileName || "The file"} is not text: it looks like a binary file with a .csv name. Import a CSV or .xlsx file.`,
      };
    if (b < 0x09 || (b > 0x0d && b < 0x20)) control++;
  }
  if (control > probe.length * 0.01)
    return { kind: "refused", message: `${fileName || "The file"} is not readable text. Import a CSV or .xlsx file.` };
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    // Spreadsheet programs on some systems still save CSV as Windows-1252; read it rather than refuse.
    text = new TextDecoder("windows-1252").decode(bytes);
  }
  if (text.charCodeAt(0) === 0xfeff) text = text.slice(1);
  return { kind: "csv", text };
}
