// What the checks say about each unit, for the badges on the plot and the rig table: the worst severity,
// the short notes in words, and the checks-page row to open. Pure.
import type { Finding, Severity } from "./types";

export type UnitFlag = {
  /** The unit as the checks name it: "12 (1st electric)". */
  unit: string;
  severity: Severity;
  /** Short phrases, worst first: "circuit 14 overloaded (25.0 A on 20 A)", "unpatched: no universe and address". */
  notes: string[];
  /** The key of the worst finding: its row on the checks page is `#<key>`. */
  findingKey: string;
};

const RANK: Record<Severity, number> = { error: 0, warning: 1, info: 2 };

/** FNV-1a, 32 bits, as base 36: short, and the same for the same finding on every request. */
function hash(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return (h >>> 0).toString(36);
}

/** The anchor of a finding's row on the checks page (`finding-dmx-1x2y3z`). */
export function findingKey(f: Pick<Finding, "area" | "subject" | "message">): string {
  return `finding-${f.area}-${hash(`${f.subject}|${f.message}`)}`;
}

/**
 * Each unit's flag from the findings (sorted worst first). A finding badges its units when it is an error or
 * a warning, or an info that says something about the unit itself (unpatched); a run's "terminate the last
 * device" reminder is no fault of that unit.
 */
export function unitFlags(findings: Finding[], labels: Map<number, string>): Record<number, UnitFlag> {
  const flags: Record<number, UnitFlag> = {};
  for (const f of [...findings].sort((a, b) => RANK[a.severity] - RANK[b.severity])) {
    if (f.severity === "info" && !f.unitNote) continue;
    const note = f.unitNote ?? f.subject;
    const key = f.key ?? findingKey(f);
    for (const id of f.fixtureIds ?? []) {
      const flag = flags[id];
      if (!flag)
        flags[id] = { unit: labels.get(id) ?? String(id), severity: f.severity, notes: [note], findingKey: key };
      else if (!flag.notes.includes(note)) flag.notes.push(note);
    }
  }
  return flags;
}

/** The words a badge is read out as: "Unit 12 (1st electric), checks: circuit 14 overloaded …". */
export function unitFlagLabel(flag: UnitFlag): string {
  const word = flag.severity === "error" ? "to fix" : flag.severity === "warning" ? "to look at" : "note";
  return `Unit ${flag.unit}, checks ${word}: ${flag.notes.join("; ")}. Open in the checks`;
}
