// Counts for pulling stock from the shop. Figures for cuts per sheet are common practice and from
// memory, not a manufacturer's table: a full sheet of colour filter is taken as 20 × 24 in
// (508 × 610 mm), and each cut as a square the size of the colour frame. Check your supplier's sheet.
import { parseColour } from "./colour";

export const SHEET_INCHES = { width: 20, height: 24 } as const; // from memory, common practice

export type StockFixture = {
  fixtureTypeId: number;
  typeName: string;
  colour: string | null;
  gobo: string | null;
  circuit: string | null;
  bodyKey: string | null;
  positionId: number;
  unitNumber: string;
};
export type StockType = { id: number; frameSize: string | null; goboSize: string | null };
export type StockAccessory = { kind: string };

export type StockCounts = {
  units: Array<{ type: string; count: number }>;
  cuts: Array<{ colour: string; frameSize: string; cuts: number; perSheet: number | null; sheets: number | null }>;
  gobos: Array<{ gobo: string; size: string; count: number }>;
  accessories: Array<{ kind: string; count: number }>;
  yCables: Array<{ circuit: string; fixtures: number; yCables: number }>;
};

/** A frame size in inches from text such as "7.5 in", '6 1/4"', "185 mm" or a bare 7.5 (read as inches). */
export function frameInches(text: string | null): number | null {
  if (!text) return null;
  const t = text.trim().toLowerCase();
  const mm = t.match(/^(\d+(?:\.\d+)?)\s*mm$/);
  if (mm) return Number(mm[1]) / 25.4; // NIST SP 811: 1 in = 25.4 mm
  const frac = t.match(/^(\d+)\s+(\d+)\/(\d+)\s*(?:in|"|inch|inches)?$/);
  if (frac) return Number(frac[1]) + Number(frac[2]) / Number(frac[3]);
  const plain = t.match(/^(\d+(?:\.\d+)?)\s*(?:in|"|inch|inches)?$/);
  return plain ? Number(plain[1]) : null;
}

/** Square cuts of side `inches` from one sheet, laid out in a grid; null when the size is unknown. */
export function cutsPerSheet(inches: number | null): number | null {
  if (!inches || inches <= 0) return null;
  return Math.floor(SHEET_INCHES.width / inches) * Math.floor(SHEET_INCHES.height / inches);
}

const bump = <K>(m: Map<K, number>, k: K, n = 1) => m.set(k, (m.get(k) ?? 0) + n);

export function stockCounts(fixtures: StockFixture[], types: StockType[], accessories: StockAccessory[]): StockCounts {
  const typeById = new Map(types.map((t) => [t.id, t]));
  const units = new Map<string, number>();
  const cuts = new Map<string, number>();
  const gobos = new Map<string, number>();
  const circuits = new Map<string, number>();
  for (const f of fixtures) {
    bump(units, f.typeName);
    const type = typeById.get(f.fixtureTypeId);
    const frame = type?.frameSize ?? "no frame size";
    for (const filter of parseColour(f.colour)) bump(cuts, `${filter}\u0000${frame}`);
    if (f.gobo?.trim()) bump(gobos, `${f.gobo.trim()}\u0000${type?.goboSize ?? "size not set"}`);
    if (f.circuit?.trim()) bump(circuits, f.circuit.trim());
  }
  const byCount = <T extends { count: number }>(a: T, b: T) => b.count - a.count;
  return {
    units: [...units]
      .map(([type, count]) => ({ type, count }))
      .sort((a, b) => byCount(a, b) || a.type.localeCompare(b.type)),
    cuts: [...cuts]
      .map(([key, count]) => {
        const [colour, frameSize] = key.split("\u0000");
        const perSheet = cutsPerSheet(frameInches(frameSize));
        return { colour, frameSize, cuts: count, perSheet, sheets: perSheet ? Math.ceil(count / perSheet) : null };
      })
      .sort(
        (a, b) =>
          a.colour.localeCompare(b.colour, undefined, { numeric: true }) || a.frameSize.localeCompare(b.frameSize),
      ),
    gobos: [...gobos].map(([key, count]) => {
      const [gobo, size] = key.split("\u0000");
      return { gobo, size, count };
    }),
    accessories: [...accessories.reduce((m, a) => bump(m, a.kind), new Map<string, number>())].map(([kind, count]) => ({
      kind,
      count,
    })),
    // Fixtures sharing a circuit are joined by a chain of two-way splitters: n units need n − 1 (common practice, no source).
    yCables: [...circuits]
      .filter(([, n]) => n > 1)
      .map(([circuit, n]) => ({ circuit, fixtures: n, yCables: n - 1 }))
      .sort((a, b) => a.circuit.localeCompare(b.circuit, undefined, { numeric: true })),
  };
}
