"use client";
// The checks page: a summary, the cautions, the findings, then DMX, power and rigging in detail.
import { useState } from "react";
import { Card } from "@/components/ui/card";
import { Button } from "@/components/ui/button";
import type { CheckArea } from "@/lib/checks/types";
import { useChecks, type ChecksData } from "./use-checks";
import { FindingsList } from "./findings-list";
import { UniverseMap } from "./universe-map";
import { DataLinesPanel } from "./data-lines-panel";
import { PowerPanel } from "./power-panel";
import { RiggingPanel } from "./rigging-panel";
import { SettingsPanel } from "./settings-panel";

export type ChecksRights = { electrics: boolean; run: boolean; export: boolean };
export type PositionChoice = { id: number; name: string; unitIds: number[] };

export function ChecksView({
  productionId,
  initial,
  positions,
  rights,
}: {
  productionId: number;
  initial: ChecksData;
  positions: PositionChoice[];
  rights: ChecksRights;
}) {
  const { data, isFetching } = useChecks(productionId, initial);
  const { report } = data;
  const [area, setArea] = useState<CheckArea | "all">("all");
  const base = `/api/productions/${productionId}/checks/export`;
  return (
    <main
      className="mx-auto flex max-w-6xl flex-col gap-4 px-4 py-6 print:max-w-none print:p-0"
      data-testid="checks-page"
    >
      <Card
        title="Checks"
        actions={
          <div className="flex flex-wrap gap-2 print:hidden">
            {rights.export ? (
              <>
                <a
                  className="inline-flex min-h-10 items-center rounded-md border border-line px-3 text-sm hover:bg-raised"
                  href={`${base}?format=xlsx`}
                  download
                >
                  Export .xlsx
                </a>
                <a
                  className="inline-flex min-h-10 items-center rounded-md border border-line px-3 text-sm hover:bg-raised"
                  href={`${base}?format=csv&part=findings`}
                  download
                >
                  Findings CSV
                </a>
              </>
            ) : null}
            <Button variant="secondary" type="button" onClick={() => window.print()}>
              Print
            </Button>
          </div>
        }
      >
        <div className="flex flex-wrap items-baseline gap-x-6 gap-y-2" data-testid="checks-summary">
          <Count n={report.summary.errors} word="to fix" tone="text-danger" />
          <Count n={report.summary.warnings} word="to look at" tone="text-caution" />
          <Count n={report.summary.infos} word="notes" tone="text-muted" />
          <span className="text-xs text-muted">
            {report.summary.fixtures} units · computed {new Date(report.computedAt).toLocaleTimeString()}
            {isFetching ? " · updating…" : ""}
          </span>
        </div>
        <p className="mt-3 text-sm" data-testid="checks-code">
          <span className="font-medium">{report.electrical.codeLabel}</span> · {report.electrical.supplyLabel} ·{" "}
          {report.electrical.voltage} V per circuit · continuous-load factor{" "}
          {report.electrical.derating == null ? "none" : `${Math.round(report.electrical.derating * 100)} %`} (
          {report.electrical.deratingSource}). {report.electrical.codeNote}
        </p>
      </Card>

      <section
        aria-label="Cautions"
        className="rounded-lg border border-caution/60 bg-surface p-4 text-sm"
        data-testid="checks-cautions"
      >
        <h2 className="mb-2 text-sm font-semibold uppercase tracking-wide text-caution">Read this first</h2>
        <ul className="list-disc space-y-1 pl-5">
          {report.cautions.general.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </section>

      <Card title="Findings" actions={<AreaFilter value={area} onChange={setArea} />}>
        <FindingsList findings={report.findings.filter((f) => area === "all" || f.area === area)} />
      </Card>

      <Card title="DMX universes">
        <UniverseMap
          universes={report.dmx.universes}
          shared={report.dmx.shared}
          unpatched={report.dmx.unpatched.length}
        />
        <DataLinesPanel
          productionId={productionId}
          lines={data.dataLines}
          results={report.dmx.dataLines}
          positions={positions}
          canEdit={rights.electrics}
        />
        <ul className="mt-3 list-disc pl-5 text-xs text-muted">
          {report.cautions.dmx.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </Card>

      <Card title="Power">
        <PowerPanel
          productionId={productionId}
          power={report.power}
          circuits={data.circuits}
          canEdit={rights.electrics}
        />
        <ul className="mt-3 list-disc pl-5 text-xs text-muted">
          {[...report.cautions.power, report.cautions.loadKindRule].map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      </Card>

      <Card title="Rigging">
        <RiggingPanel
          productionId={productionId}
          rigging={report.rigging}
          liftLines={report.liftLines}
          canEdit={rights.run}
        />
      </Card>

      <Card title="Electrical code and allowances" className="print:hidden">
        <SettingsPanel
          key={report.settings.version}
          productionId={productionId}
          settings={report.settings}
          canEdit={rights.run}
        />
      </Card>
    </main>
  );
}

function Count({ n, word, tone }: { n: number; word: string; tone: string }) {
  return (
    <span className={n ? tone : "text-muted"}>
      <span className="text-2xl font-semibold tabular-nums">{n}</span> <span className="text-sm">{word}</span>
    </span>
  );
}

function AreaFilter({ value, onChange }: { value: CheckArea | "all"; onChange: (v: CheckArea | "all") => void }) {
  return (
    <select
      aria-label="Show findings of"
      value={value}
      onChange={(e) => onChange(e.target.value as CheckArea | "all")}
      className="min-h-9 rounded-md border border-line bg-surface px-2 text-sm print:hidden"
    >
      <option value="all">all checks</option>
      <option value="dmx">DMX</option>
      <option value="power">power</option>
      <option value="rigging">rigging</option>
    </select>
  );
}
