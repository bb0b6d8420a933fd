// Cell values straight from a workbook's XML (ECMA-376 Part 1, SpreadsheetML: workbook.xml, the
// workbook's relationships, sharedStrings.xml, styles.xml and each sheet's <sheetData>), for import.
// ExcelJS builds a Row and Cell object per cell even in its streaming reader, which made reading a
// 5,000-row file ten times slower than reading the same rows from CSV (docs/benchmarks.md); importing
// needs only each cell's text. Unzipped with fflate. Anything laid out in a way this reader does not
// expect (prefixed XML names, a missing part) returns null, and the caller reads the file with ExcelJS.
import { unzipSync, zipSync } from "fflate";
import { checkColumn, checkDeclaredDimension } from "./sheet-limits";
import { FileProblem, type RawRow } from "./raw-table";

export type XmlSheet = { name: string; read: () => { records: RawRow[]; merges: string[] } };
export type XmlWorkbook = { sheets: XmlSheet[] };

const ENTITY: Record<string, string> = { lt: "<", gt: ">", amp: "&", quot: '"', apos: "'" };
// XML entities, then Excel's _xHHHH_ escapes for characters XML cannot hold (ECMA-376 ST_Xstring).
function decodeText(s: string): string {
  if (s.includes("&"))
    s = s.replace(/&(#x[0-9a-fA-F]+|#[0-9]+|[a-z]+);/g, (m, e: string) =>
      e[0] === "#"
        ? String.fromCodePoint(e[1] === "x" ? parseInt(e.slice(2), 16) : Number(e.slice(1)))
        : (ENTITY[e] ?? m),
    );
  if (s.includes("_x")) s = s.replace(/_x([0-9A-Fa-f]{4})_/g, (_, h: string) => String.fromCharCode(parseInt(h, 16)));
  return s;
}

const ATTR = new Map<string, RegExp>();
const attr = (attrs: string, name: string): string | undefined => {
  let re = ATTR.get(name);
  if (!re) ATTR.set(name, (re = new RegExp(`(?:^|\\s)${name}="([^"]*)"`)));
  return re.exec(attrs)?.[1];
};

// The text runs of a string item (<si> or <is>), without phonetic guides (<rPh>).
function itemText(xml: string): string {
  const body = xml.includes("<rPh") ? xml.replace(/<rPh\b[\s\S]*?<\/rPh>/g, "") : xml;
  let out = "";
  for (const m of body.matchAll(/<t\b[^>]*?(?:\/>|>([\s\S]*?)<\/t>)/g)) out += m[1] ?? "";
  return decodeText(out);
}

function sharedStrings(xml: string | null): string[] {
  if (!xml) return [];
  return Array.from(xml.matchAll(/<si\b[^>]*?(?:\/>|>([\s\S]*?)<\/si>)/g), (m) => itemText(m[1] ?? ""));
}

// Built-in number formats that show dates or times (ECMA-376 Part 1, 18.8.30).
const DATE_FORMAT_IDS = new Set([14, 15, 16, 17, 18, 19, 20, 21, 22, 45, 46, 47]);
// A custom format shows a date when, outside quoted text and [colour]/[condition] parts, it has y m d h s.
const isDateCode = (code: string) => /[ymdhs]/i.test(code.replace(/\[[^\]]*]/g, "").replace(/"[^"]*"/g, ""));

/** For each cell style index (the s attribute), whether its number format shows a date. */
function dateStyles(xml: string | null): boolean[] {
  if (!xml) return [];
  const custom = new Map<number, string>();
  for (const m of xml.matchAll(/<numFmt\b([^>]*)\/?>/g))
    custom.set(Number(attr(m[1], "numFmtId")), decodeText(attr(m[1], "formatCode") ?? ""));
  const xfs = /<cellXfs\b[^>]*>([\s\S]*?)<\/cellXfs>/.exec(xml)?.[1] ?? "";
  return Array.from(xfs.matchAll(/<xf\b([^>]*?)\/?>/g), (m) => {
    const id = Number(attr(m[1], "numFmtId") ?? 0);
    return DATE_FORMAT_IDS.has(id) || (custom.has(id) && isDateCode(custom.get(id)!));
  });
}

const columnNumber = (letters: string) => {
  let n = 0;
  for (let i = 0; i < letters.length; i++) n = n * 26 + letters.charCodeAt(i) - 64;
  return n;
};

// Excel's day numbers count from 1899-12-30 (1904-01-01 in 1904 workbooks); same formula as ExcelJS.
const serialDate = (serial: number, date1904: boolean) =>
  new Date(Math.round((serial - 25569 + (date1904 ? 1462 : 0)) * 86_400_000)).toISOString().slice(0, 10);

type Context = { strings: string[]; dates: boolean[]; date1904: boolean };

function cellText(attrs: string, body: string, ctx: Context): string {
  const type = attr(attrs, "t") ?? "n";
  if (type === "inlineStr") {
    const is = /<is\b[^>]*>([\s\S]*?)<\/is>/.exec(body);
    return is ? itemText(is[1]) : "";
  }
  const v = /<v\b[^>]*>([\s\S]*?)<\/v>/.exec(body)?.[1];
  if (v === undefined) return "";
  switch (type) {
    case "s":
      return ctx.strings[Number(v)] ?? "";
    case "str":
      return decodeText(v);
    case "b":
      return v.trim() === "0" ? "no" : "yes";
    case "e":
      return "";
    case "d":
      return decodeText(v).slice(0, 10);
    default: {
      const n = Number(v);
      if (!Number.isFinite(n)) return "";
      const s = attr(attrs, "s");
      return s !== undefined && ctx.dates[Number(s)] ? serialDate(n, ctx.date1904) : String(n);
    }
  }
}

function readSheetXml(xml: string, ctx: Context) {
  checkDeclaredDimension(/<dimension\b[^>]*?\bref="([^"]*)"/.exec(xml.slice(0, 4096))?.[1]);
  const records: RawRow[] = [];
  let rowNumber = 0;
  for (const row of xml.matchAll(/<row\b([^>]*?)(?:\/>|>([\s\S]*?)<\/row>)/g)) {
    // An index that is missing or unreadable (a damaged file) means the row after the one before it, as a
    // row without r does (ECMA-376 Part 1, §18.3.1.73); never NaN, which messages would show as "row null".
    const r = attr(row[1], "r");
    rowNumber = r && /^[1-9]\d*$/.test(r) ? Number(r) : rowNumber + 1;
    if (!row[2]) continue;
    const cells: string[] = [];
    let col = 0;
    for (const c of row[2].matchAll(/<c\b([^>]*?)(?:\/>|>([\s\S]*?)<\/c>)/g)) {
      const ref = attr(c[1], "r");
      const letters = ref ? /^[A-Z]+/.exec(ref)?.[0] : undefined;
      col = letters ? columnNumber(letters) : col + 1;
      checkColumn(col, rowNumber);
      const text = c[2] ? cellText(c[1], c[2], ctx).trim() : "";
      while (cells.length < col - 1) cells.push("");
      cells[col - 1] = text;
    }
    if (cells.some((c) => c !== "")) records.push({ rowNumber, cells });
  }
  const merges = Array.from(xml.matchAll(/<mergeCell\b[^>]*?\bref="([A-Z]+[0-9]+:[A-Z]+[0-9]+)"/g), (m) => m[1]);
  return { records, merges };
}

// A relationship target is relative to the part that names it (xl/), or absolute from the package root.
/** More sheet XML than 20,000 rows of every column would need (about 40 MB); a workbook past it is refused. */
export const MAX_UNZIPPED_BYTES = 256 * 1024 * 1024;

const resolveTarget = (target: string) =>
  target.startsWith("/") ? target.slice(1) : `xl/${target.replace(/^\.\//, "")}`;

/**
 * The sheets of a workbook in tab order, each read only when asked. Throws when the bytes are not a
 * zip; null when the zip does not hold a workbook laid out as this reader expects.
 */
// A few megabytes of zip can unpack to gigabytes (a "zip bomb"); the parts' declared sizes are added up
// before anything is inflated, and the file is refused past the cap instead of exhausting the server.
function unzipCapped(bytes: Uint8Array, wanted: (name: string) => boolean, maxUnzippedBytes: number) {
  let unzipped = 0;
  return unzipSync(bytes, {
    filter: (f) => {
      if (!wanted(f.name)) return false;
      unzipped += f.originalSize;
      if (unzipped > maxUnzippedBytes)
        throw new FileProblem(
          `This workbook unpacks to more than ${Math.round(maxUnzippedBytes / 1048576)} MB of sheet data, more than a rig needs. Save the rig's sheet on its own, or as CSV.`,
        );
      return true;
    },
  });
}

/**
 * The same workbook, unpacked and packed again (stored, not compressed) so that what reaches ExcelJS
 * is a well-formed zip. ExcelJS's streaming unzip waits forever on some damaged archives (a flipped
 * byte in a local header; found by tests/unit/fuzz/readers.test.ts), which would hang an upload.
 * Throws when the bytes do not unpack.
 */
export function repackWorkbook(bytes: Uint8Array, { maxUnzippedBytes = MAX_UNZIPPED_BYTES } = {}): Uint8Array {
  return zipSync(
    unzipCapped(bytes, () => true, maxUnzippedBytes),
    { level: 0 },
  );
}

export function openXmlWorkbook(bytes: Uint8Array, { maxUnzippedBytes = MAX_UNZIPPED_BYTES } = {}): XmlWorkbook | null {
  const files = unzipCapped(
    bytes,
    (name) => name.startsWith("xl/") && (name.endsWith(".xml") || name.endsWith(".rels")),
    maxUnzippedBytes,
  );
  // Node's own UTF-8 decoding is several times faster than fflate's strFromU8 on a sheet of megabytes.
  const text = (name: string) =>
    files[name]
      ? Buffer.from(files[name].buffer, files[name].byteOffset, files[name].byteLength).toString("utf8")
      : null;
  const workbook = text("xl/workbook.xml");
  const rels = text("xl/_rels/workbook.xml.rels");
  if (!workbook || !rels || !workbook.includes("<sheets")) return null;
  const targets = new Map<string, { type: string; path: string }>();
  for (const m of rels.matchAll(/<Relationship\b([^>]*?)\/?>/g)) {
    const id = attr(m[1], "Id");
    const target = attr(m[1], "Target");
    if (id && target) targets.set(id, { type: attr(m[1], "Type") ?? "", path: resolveTarget(decodeText(target)) });
  }
  const partOf = (kind: string, fallback: string) =>
    [...targets.values()].find((t) => t.type.endsWith(`/${kind}`))?.path ?? fallback;
  const ctx: Context = {
    strings: sharedStrings(text(partOf("sharedStrings", "xl/sharedStrings.xml"))),
    dates: dateStyles(text(partOf("styles", "xl/styles.xml"))),
    date1904: /<workbookPr\b[^>]*\bdate1904="(?:1|true)"/.test(workbook),
  };
  const sheets: XmlSheet[] = [];
  for (const m of workbook.matchAll(/<sheet\b([^>]*?)\/?>/g)) {
    const name = decodeText(attr(m[1], "name") ?? "");
    const path = targets.get(attr(m[1], "r:id") ?? "")?.path;
    const xml = path ? text(path) : null;
    // Not a worksheet (a chart sheet), or a sheet whose XML uses prefixed names: let ExcelJS read it.
    if (!xml || !xml.includes("<sheetData")) return null;
    sheets.push({ name, read: () => readSheetXml(xml, ctx) });
  }
  return sheets.length ? { sheets } : null;
}
