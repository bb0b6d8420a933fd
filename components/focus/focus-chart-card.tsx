// One focus chart card. The screen, the browser's print view and the server's PDF all render this component
// with the stylesheet in lib/focus/chart-css.ts, so what prints is what the screen shows. Every text on it
// (names, notes, purposes) goes through React, which escapes it. No hooks and no context: the server's PDF
// renders it with react-dom/server outside the React Server Components bundle.
import type { Units } from "@/lib/optics";
import type { ChartRow, FocusChart } from "@/lib/focus/chart-model";
import type { Landmark } from "@/lib/focus/landmarks";
import { PoolDiagram } from "./pool-diagram";

const SHORT: Record<string, string> = { top: "T", bottom: "B", left: "L", right: "R" };

function Rows({ list, skip = [] }: { list: ChartRow[]; skip?: string[] }) {
  return list
    .filter((r) => !skip.includes(r.key))
    .map((r) => (
      <div key={r.key} className="fc-row" data-key={r.key}>
        <dt>{r.label}</dt>
        <dd>{r.value}</dd>
      </div>
    ));
}

function Cuts({ chart }: { chart: FocusChart }) {
  if (!chart.cuts.length) return <p className="fc-none">No cuts.</p>;
  return (
    <ol className="fc-cutlist">
      {chart.cuts.map((c, n) => (
        <li key={n}>
          <b>{c.words}</b>
          {` — ${c.cutterWords}`}
        </li>
      ))}
    </ol>
  );
}

function Note({ label, text, className }: { label: string; text: string | null; className: string }) {
  return (
    <div className={`fc-note ${className}`}>
      <span className="fc-note-label">{label}</span> {text?.trim() ? text : <span className="fc-none">none</span>}
    </div>
  );
}

// The deck photo beside the notes: a small copy (a data: URL in the server's PDF), linked to the full one on screen.
function Photo({ chart }: { chart: FocusChart }) {
  if (!chart.photo) return null;
  // Lazy on screen, where a long list may hold hundreds; the PDF's inline copies load with the page.
  const img = (
    <img
      src={chart.photo.thumbSrc}
      loading={chart.photo.href ? "lazy" : undefined}
      alt={`As focused: ${chart.positionName} unit ${chart.unitNumber}`}
      data-testid="focus-photo-thumb"
    />
  );
  return chart.photo.href ? (
    <a className="fc-photo" href={chart.photo.href} target="_blank" rel="noopener">
      {img}
    </a>
  ) : (
    <span className="fc-photo">{img}</span>
  );
}

export function FocusChartCard({
  chart,
  landmarks,
  units,
}: {
  chart: FocusChart;
  landmarks: Landmark[];
  units: Units;
}) {
  return (
    <article className="fc-card" data-testid="focus-chart" data-fixture-id={chart.id}>
      <header className="fc-head">
        <h2 className="fc-title">{`${chart.positionName} · unit ${chart.unitNumber}`}</h2>
        <span className="fc-chan">{`ch ${chart.channel ?? "—"}`}</span>
        <span className={chart.focused ? "fc-status fc-done" : "fc-status"}>{chart.focusedLine}</span>
      </header>
      <div className="fc-body">
        <figure className="fc-figure">
          <PoolDiagram
            fixture={chart.fixture}
            landmarks={landmarks}
            units={units}
            cutLabels={chart.cuts.map((c) => (c.physical ? SHORT[c.physical] : ""))}
          />
        </figure>
        <dl className="fc-fields fc-identity">
          <Rows list={chart.identity} skip={["position", "unit", "channel"]} />
        </dl>
        <dl className="fc-fields fc-focus">
          <Rows list={chart.focus} />
          <Rows list={chart.beam} />
        </dl>
      </div>
      <section className="fc-cuts">
        <h3>Cuts</h3>
        <Cuts chart={chart} />
      </section>
      <div className="fc-foot">
        <section className="fc-notes">
          <Note label="Designer:" text={chart.notes} className="fc-designer" />
          <Note label="As focused:" text={chart.focusNotes} className="fc-electrician" />
        </section>
        <Photo chart={chart} />
      </div>
      {chart.warnings.length ? <p className="fc-warn-text">{chart.warnings.join(" ")}</p> : null}
    </article>
  );
}
