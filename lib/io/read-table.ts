import { readCsv } from "./csv-read";
import { readXlsx } from "./xlsx-read";
import { sniffFile } from "./file-kind";
import { looksLikeFixtureHeader } from "./fields";
import { FileProblem, type RawTable } from "./raw-table";

/** Bytes of an uploaded file → a table, whatever the file's name says; problems are FileProblems. */
export async function readTable(
  bytes: Uint8Array,
  fileName: string,
  opts: { sheet?: string } = {},
): Promise<RawTable & { format: "csv" | "xlsx" }> {
  const sniffed = sniffFile(bytes, fileName);
  if (sniffed.kind === "refused") throw new FileProblem(sniffed.message);
  if (sniffed.kind === "csv") return { ...readCsv(sniffed.text), format: "csv" };
  return {
    ...(await readXlsx(sniffed.bytes, { sheet: opts.sheet, looksLikeHeader: looksLikeFixtureHeader })),
    format: "xlsx",
  };
}
