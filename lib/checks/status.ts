// What the overview says about the checks: which have not run yet (and why), and what they found.
// Never an all-clear that no check stands behind.
import type { ChecksResult } from "./index";

export type CheckStatusLine = { tone: "error" | "warning" | "muted" | "ok"; text: string };

export function checksStatusLines(
  r: Pick<ChecksResult, "summary" | "power" | "rigging">,
  facts: { patched: number; fixtures: number },
): CheckStatusLine[] {
  const lines: CheckStatusLine[] = [];
  if (r.summary.errors)
    lines.push({
      tone: "error",
      text: `${r.summary.errors} problem${r.summary.errors === 1 ? "" : "s"} to fix in the checks.`,
    });
  if (r.summary.warnings)
    lines.push({
      tone: "warning",
      text: `${r.summary.warnings} warning${r.summary.warnings === 1 ? "" : "s"} to look at in the checks.`,
    });
  if (!facts.fixtures) lines.push({ tone: "muted", text: "Nothing checked yet: the rig has no fixtures." });
  else {
    if (!r.power.circuits.length)
      lines.push({ tone: "muted", text: "Power not checked: no circuits or dimmers entered with their rating." });
    else if (r.power.notOnCircuit.length === facts.fixtures)
      lines.push({ tone: "muted", text: "Power not checked: no unit names a circuit or dimmer." });
    if (!facts.patched) lines.push({ tone: "muted", text: "DMX not checked: no unit is patched." });
    const unrated = r.rigging.positions.filter((p) => p.status === "no-rating" && p.units > 0).length;
    if (unrated)
      lines.push({
        tone: "muted",
        text: `Rigging: ${unrated} position${unrated === 1 ? " has" : "s have"} no rated load entered, so ${unrated === 1 ? "it is" : "they are"} not checked.`,
      });
    if (r.power.notCounted.length || r.rigging.notCounted.length)
      lines.push({ tone: "muted", text: "Some units have no wattage or weight: they are not counted in the totals." });
  }
  if (!lines.length)
    lines.push({
      tone: "ok",
      text: "The checks found nothing to fix. They are planning aids: see the cautions on the checks page.",
    });
  return lines;
}
