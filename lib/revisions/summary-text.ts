// The words of a revision's e-mail and of its change list in plain text: what was issued, by whom, for
// what, and what changed since the previous revision, group by group.
import { showValue } from "./history-lines";
import type { ChangeLine, RevisionDiff, RevisionDto } from "./types";

const PURPOSE_WORDS: Record<RevisionDto["issuedFor"], string> = {
  bid: "the bid",
  hang: "the hang",
  focus: "the focus",
  tech: "technical rehearsals",
  archive: "the archive",
};
export const purposeWords = (p: RevisionDto["issuedFor"]) => PURPOSE_WORDS[p];

/** The groups in reading order with their headings. */
export const FIXTURE_GROUP_WORDS = [
  ["added", "Fixtures added"],
  ["removed", "Fixtures removed"],
  ["refocused", "Fixtures refocused"],
  ["repatched", "Fixtures re-patched"],
  ["recoloured", "Fixtures recoloured"],
  ["otherwise", "Fixtures otherwise changed"],
] as const;
export const CUE_GROUP_WORDS = [
  ["added", "Cues added"],
  ["removed", "Cues removed"],
  ["retimed", "Cues retimed"],
  ["relevelled", "Cues re-levelled"],
  ["otherwise", "Cues otherwise changed"],
] as const;
export const ROW_GROUP_WORDS = [
  ["added", "added"],
  ["removed", "removed"],
  ["changed", "changed"],
] as const;

/** One change line as text: "LX1 unit 3 (channel 11): Colour pale blue → deep blue". */
export function lineText(line: ChangeLine): string {
  const parts = [
    ...line.changes.map((c) => `${c.label} ${showValue(c.before)} → ${showValue(c.after)}`),
    ...(line.levels ?? []).map((l) => `ch ${l.channel} ${showValue(l.before)} → ${showValue(l.after)}`),
  ];
  return parts.length ? `${line.name}: ${parts.join("; ")}` : line.name;
}

/** Lines a group lists in the e-mail before "and N more" (the page lists them all). */
const MAX_LINES = 40;

function groupText(heading: string, lines: ChangeLine[]): string[] {
  if (!lines.length) return [];
  const shown = lines.slice(0, MAX_LINES).map((l) => `  - ${lineText(l)}`);
  if (lines.length > MAX_LINES) shown.push(`  … and ${lines.length - MAX_LINES} more (see the revisions page)`);
  return [`${heading} (${lines.length}):`, ...shown, ""];
}

/** The change list as plain text, every group that has something in it. */
export function changesText(diff: RevisionDiff): string {
  const out = [
    ...FIXTURE_GROUP_WORDS.flatMap(([k, h]) => groupText(h, diff.fixtures[k])),
    ...CUE_GROUP_WORDS.flatMap(([k, h]) => groupText(h, diff.cues[k])),
    ...ROW_GROUP_WORDS.flatMap(([k, h]) => groupText(`Positions ${h}`, diff.positions[k])),
    ...ROW_GROUP_WORDS.flatMap(([k, h]) => groupText(`Types ${h}`, diff.types[k])),
  ];
  return out.length ? out.join("\n") : "Nothing on the paperwork has changed.\n";
}

export function revisionMailText(opts: {
  productionName: string;
  revision: RevisionDto;
  previousLabel: string | null;
  diff: RevisionDiff;
  link: string;
  attachmentsNote: string | null;
}): { subject: string; text: string } {
  const { productionName, revision, previousLabel, diff, link, attachmentsNote } = opts;
  const since = previousLabel ? `Changes since revision ${previousLabel}` : "First revision: everything is new";
  const text = [
    `${productionName}: revision ${revision.label} has been issued for ${purposeWords(revision.issuedFor)}` +
      (revision.issuedBy ? ` by ${revision.issuedBy}.` : "."),
    ...(revision.note ? ["", `Note: ${revision.note}`] : []),
    "",
    `${since}:`,
    "",
    changesText(diff),
    ...(attachmentsNote ? [attachmentsNote, ""] : []),
    `The full list, and any two revisions compared: ${link}`,
    "",
    "You get this because you are on the team of this production. You can stop these messages from the team page.",
  ].join("\n");
  return { subject: `${productionName}: revision ${revision.label} (${revision.issuedFor})`, text };
}
