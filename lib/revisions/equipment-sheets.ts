// The equipment list and the add / return list as sheets for the CSV and Excel writers (lib/io).
import type { SheetOut } from "@/lib/io/sheet";
import type { EquipmentLine, ShopLine } from "./equipment";

const KIND = { type: "Fixture", accessory: "Accessory" } as const;

export function equipmentSheet(lines: EquipmentLine[], sparesPercent: number, label: string): SheetOut {
  return {
    name: `Equipment ${label}`.slice(0, 31),
    columns: [
      { header: "Kind", width: 10 },
      { header: "Item", width: 30 },
      { header: "In the rig", width: 11 },
      { header: `Spares (${sparesPercent} %)`, width: 13 },
      { header: "Total", width: 8 },
    ],
    rows: lines.map((l) => [KIND[l.kind], l.name, l.inUse, l.spares, l.total]),
  };
}

export function addReturnSheet(lines: ShopLine[], from: string, to: string): SheetOut {
  return {
    name: `Add-return ${from} to ${to}`.replace(/[\\/?*[\]:]/g, "-").slice(0, 31),
    columns: [
      { header: "Kind", width: 10 },
      { header: "Item", width: 30 },
      { header: `Total at ${from}`, width: 12 },
      { header: `Total at ${to}`, width: 12 },
      { header: "Send (add)", width: 11 },
      { header: "Take back (return)", width: 18 },
    ],
    rows: lines.map((l) => [KIND[l.kind], l.name, l.before, l.after, l.add, l.return]),
  };
}
