"use client";

import type { FixtureDto } from "@/lib/dto/fixture";
import type { FixtureTypeDto } from "@/lib/dto/fixture-type";
import type { AccessoryDto } from "@/lib/dto/accessory";
import { SHEET_INCHES, stockCounts } from "@/lib/rig/stock";

function Block({
  title,
  head,
  rows,
  note,
}: {
  title: string;
  head: string[];
  rows: Array<Array<string | number | null>>;
  note?: string;
}) {
  return (
    <section className="rounded-lg border border-line bg-surface p-3 print:break-inside-avoid print:border-0">
      <h2 className="mb-2 text-sm font-semibold">{title}</h2>
      {rows.length ? (
        <table className="w-full text-sm">
          <thead>
            <tr>
              {head.map((h) => (
                <th key={h} scope="col" className="border-b border-line py-1 text-left text-xs">
                  {h}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map((r, i) => (
              <tr key={i} className="border-b border-line/50">
                {r.map((c, j) => (
                  <td key={j} className="py-1 pr-2">
                    {c ?? "—"}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      ) : (
        <p className="text-sm text-muted">None.</p>
      )}
      {note ? <p className="mt-2 text-xs text-muted">{note}</p> : null}
    </section>
  );
}

export function StockPanel({
  fixtures,
  types,
  accessories,
}: {
  fixtures: FixtureDto[];
  types: FixtureTypeDto[];
  accessories: AccessoryDto[];
}) {
  const s = stockCounts(fixtures, types, accessories);
  return (
    <div className="grid gap-3 md:grid-cols-2 print:grid-cols-1" data-testid="stock-panel">
      <Block title="Units by type" head={["Type", "Units"]} rows={s.units.map((u) => [u.type, u.count])} />
      <Block
        title="Colour cuts"
        head={["Filter", "Frame", "Cuts", "Per sheet", "Sheets"]}
        rows={s.cuts.map((c) => [c.colour, c.frameSize, c.cuts, c.perSheet, c.sheets])}
        note={`A colour field such as "pale blue + light frost" is one cut of each filter. Cuts per sheet assume a ${SHEET_INCHES.width} × ${SHEET_INCHES.height} in sheet and square cuts the size of the frame (common practice, from memory); check your supplier's sheet size.`}
      />
      <Block
        title="Gobos by size"
        head={["Gobo", "Size", "Count"]}
        rows={s.gobos.map((g) => [g.gobo, g.size, g.count])}
      />
      <Block title="Accessories" head={["Kind", "Count"]} rows={s.accessories.map((a) => [a.kind, a.count])} />
      <Block
        title="Y-cables for shared circuits"
        head={["Circuit", "Fixtures", "Y-cables"]}
        rows={s.yCables.map((y) => [y.circuit, y.fixtures, y.yCables])}
        note="Units sharing a circuit are joined with two-way splitters: n units need n − 1. Check the circuit's load against its rating; local codes and a qualified electrician govern."
      />
    </div>
  );
}
