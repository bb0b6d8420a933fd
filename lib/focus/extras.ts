// Chart values that live on a fixture's accessories rather than on the fixture itself.
import type { ChartExtras } from "./chart-model";

export type AccessoryLite = { fixtureId: number; kind: string; notes: string | null };

/** Accessories grouped by fixture: their names for the chart, and barn doors called out on their own line. */
export function extrasByFixture(list: AccessoryLite[]): Record<number, ChartExtras> {
  const out: Record<number, ChartExtras> = {};
  for (const a of list) {
    const e = (out[a.fixtureId] ??= { accessories: [] });
    const label = a.notes?.trim() ? `${a.kind} (${a.notes.trim()})` : a.kind;
    e.accessories!.push(label);
    if (/barn/i.test(a.kind)) e.barnDoors = a.notes?.trim() ? `fitted: ${a.notes.trim()}` : "fitted";
    if (/gobo/i.test(a.kind) && a.notes?.trim()) e.goboOrientation = a.notes.trim();
  }
  return out;
}
