// Printed sheets of focus charts: each sheet carries its own header (production, positions, print time,
// page x of y), so the browser's print and the server's PDF number pages alike. No hooks and no context:
// the server's PDF renders each sheet with react-dom/server outside the React Server Components bundle.
import type { Units } from "@/lib/optics";
import type { Landmark } from "@/lib/focus/landmarks";
import type { ChartsPerPage, Sheet } from "@/lib/focus/pages";
import { FocusChartCard } from "./focus-chart-card";

export type SheetOptions = {
  productionName: string;
  printedAt: string;
  /** The latest issued revision's label, printed on every sheet; null before the first. */
  revision?: string | null;
  perPage: ChartsPerPage;
  units: Units;
  landmarks: Landmark[];
};

export function EmptySheet({ perPage }: { perPage: ChartsPerPage }) {
  return (
    <section className={`fc-sheet fc-n${perPage}`}>
      <p>No fixtures match these filters.</p>
    </section>
  );
}

export function FocusSheet({ sheet, o }: { sheet: Sheet; o: SheetOptions }) {
  return (
    <section className={`fc-sheet fc-n${o.perPage}`} data-testid="focus-sheet">
      <header className="fc-sheet-head">
        <span>
          <b>{o.productionName}</b>
          {` · ${sheet.positions.join(", ")}`}
        </span>
        <span>{`Focus charts${o.revision ? ` · revision ${o.revision}` : ""} · printed ${o.printedAt} · page ${sheet.page} of ${sheet.of}`}</span>
      </header>
      <div className="fc-grid">
        {sheet.charts.map((c) => (
          <FocusChartCard key={c.id} chart={c} landmarks={o.landmarks} units={o.units} />
        ))}
      </div>
    </section>
  );
}

export function FocusSheets({ sheets, o }: { sheets: Sheet[]; o: SheetOptions }) {
  if (!sheets.length) return <EmptySheet perPage={o.perPage} />;
  return sheets.map((s) => <FocusSheet key={s.page} sheet={s} o={o} />);
}
