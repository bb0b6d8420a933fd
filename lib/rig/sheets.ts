// Turns the rig into sheets for export: one view → one sheet, or the full workbook with a sheet per
// view and the stock counts. Rows follow each view's sort so the paper matches the screen.
import type { FixtureDto } from "@/lib/dto/fixture";
import type { SheetOut } from "@/lib/io/sheet";
import { COLUMN_BY_ID, exportValue, headerWithUnit, type Units } from "./columns";
import { RIG_VIEWS, type RigView } from "./views";
import { compareUnitNumbers } from "./unit-number";
import type { StockCounts } from "./stock";

/** Sorts by the view's keys; position sorts by hanging order (the order the API returns). */
export function sortForView(fixtures: FixtureDto[], view: RigView): FixtureDto[] {
  const hangOrder = new Map<number, number>();
  fixtures.forEach((f) => hangOrder.has(f.positionId) || hangOrder.set(f.positionId, hangOrder.size));
  const cmp = (a: FixtureDto, b: FixtureDto, id: string): number => {
    if (id === "position") return hangOrder.get(a.positionId)! - hangOrder.get(b.positionId)!;
    if (id === "unitNumber") return compareUnitNumbers(a.unitNumber, b.unitNumber);
    const va = COLUMN_BY_ID.get(id)!.value(a);
    const vb = COLUMN_BY_ID.get(id)!.value(b);
    if (va == null || vb == null) return va == null ? (vb == null ? 0 : 1) : -1; // empty cells last
    return typeof va === "number" && typeof vb === "number"
      ? va - vb
      : String(va).localeCompare(String(vb), undefined, { numeric: true });
  };
  return [...fixtures].sort((a, b) => {
    for (const s of view.sort) {
      const d = cmp(a, b, s.id) * (s.desc ? -1 : 1);
      if (d) return d;
    }
    return (
      hangOrder.get(a.positionId)! - hangOrder.get(b.positionId)! || compareUnitNumbers(a.unitNumber, b.unitNumber)
    );
  });
}

export function viewSheet(fixtures: FixtureDto[], view: RigView, units: Units, columnIds = view.columns): SheetOut {
  const columns = columnIds.map((id) => COLUMN_BY_ID.get(id)!).filter(Boolean);
  return {
    name: view.label,
    columns: columns.map((c) => ({
      header: headerWithUnit(c, units),
      width: Math.max(c.width, headerWithUnit(c, units).length + 2),
    })),
    rows: sortForView(fixtures, view).map((f) => columns.map((c) => exportValue(c, f, units))),
  };
}

export function stockSheets(stock: StockCounts): SheetOut[] {
  const w = (header: string, width = 14) => ({ header, width: Math.max(width, header.length + 2) });
  return [
    { name: "Stock - units", columns: [w("Type", 28), w("Units")], rows: stock.units.map((u) => [u.type, u.count]) },
    {
      name: "Stock - colour",
      columns: [w("Filter", 16), w("Frame size"), w("Cuts"), w("Cuts per sheet"), w("Sheets")],
      rows: stock.cuts.map((c) => [c.colour, c.frameSize, c.cuts, c.perSheet, c.sheets]),
    },
    {
      name: "Stock - gobos",
      columns: [w("Gobo", 20), w("Size"), w("Count")],
      rows: stock.gobos.map((g) => [g.gobo, g.size, g.count]),
    },
    {
      name: "Stock - accessories",
      columns: [w("Kind", 20), w("Count")],
      rows: stock.accessories.map((a) => [a.kind, a.count]),
    },
    {
      name: "Stock - Y-cables",
      columns: [w("Circuit"), w("Fixtures"), w("Y-cables")],
      rows: stock.yCables.map((y) => [y.circuit, y.fixtures, y.yCables]),
    },
  ];
}

export type SheetAccessory = {
  fixtureId: number;
  kind: string;
  universe: number | null;
  address: number | null;
  footprint: number | null;
  wattage: number;
  weightKg: number;
  notes: string | null;
};

/** Every accessory on its own row, in hanging order of the fixture it is on. */
export function accessorySheet(accessories: SheetAccessory[], fixtures: FixtureDto[]): SheetOut {
  const order = new Map(fixtures.map((f, i) => [f.id, i])); // the API returns fixtures in hanging order
  const byId = new Map(fixtures.map((f) => [f.id, f]));
  const w = (header: string, width = 12) => ({ header, width: Math.max(width, header.length + 2) });
  const rows = [...accessories]
    .filter((a) => byId.has(a.fixtureId))
    .sort((a, b) => order.get(a.fixtureId)! - order.get(b.fixtureId)! || a.kind.localeCompare(b.kind))
    .map((a) => {
      const f = byId.get(a.fixtureId)!;
      return [f.positionName, f.unitNumber, a.kind, a.universe, a.address, a.footprint, a.wattage, a.weightKg, a.notes];
    });
  return {
    name: "Accessories",
    columns: [
      w("Position", 18),
      w("Unit", 8),
      w("Kind", 16),
      w("Universe"),
      w("Address"),
      w("Slots"),
      w("Power (W)"),
      w("Weight (kg)"),
      w("Notes", 24),
    ],
    rows,
  };
}

export function workbookSheets(
  fixtures: FixtureDto[],
  units: Units,
  stock: StockCounts,
  accessories: SheetAccessory[] = [],
): SheetOut[] {
  return [
    ...RIG_VIEWS.filter((v) => v.id !== "stock").map((v) => viewSheet(fixtures, v, units)),
    accessorySheet(accessories, fixtures),
    ...stockSheets(stock),
  ];
}
