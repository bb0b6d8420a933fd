"use client";

import { useEffect, useMemo, useRef, useState } from "react";
import { usePathname, useRouter } from "next/navigation";
import type { FixtureDto } from "@/lib/dto/fixture";
import type { FixtureTypeDto } from "@/lib/dto/fixture-type";
import type { AccessoryDto } from "@/lib/dto/accessory";
import { RIG_COLUMNS, type Units } from "@/lib/rig/columns";
import { RIG_VIEWS, VIEW_BY_ID, type RigViewId } from "@/lib/rig/views";
import { useRigAccessories, useRigFixtures, useRigTypes } from "@/hooks/use-rig";
import { Button } from "@/components/ui/button";
import { RigTable, type TableState } from "./rig-table";
import { BulkBar } from "./bulk-bar";
import { ColumnChooser } from "./column-chooser";
import { ImportPanel } from "./import-panel";
import { StockPanel } from "./stock-panel";
import { TypesPanel } from "./types-panel";
import { AccessoriesPanel } from "./accessories-panel";
import { useRigDelete } from "./use-rig-delete";

type Rights = { editable: string[]; typeFields: string[]; canImport: boolean; canPlot: boolean; canElectrics: boolean };
type Props = {
  productionId: number;
  productionName: string;
  units: Units;
  initialView: RigViewId;
  initialFixtures: FixtureDto[];
  initialTypes: FixtureTypeDto[];
  initialAccessories: AccessoryDto[];
  positions: Array<{ id: number; name: string }>;
  rights: Rights;
};

function stateFor(view: RigViewId): TableState {
  const v = VIEW_BY_ID.get(view)!;
  return {
    sorting: v.sort.map((s) => ({ id: s.id, desc: Boolean(s.desc) })),
    grouping: v.groupBy ? [v.groupBy] : [],
    visibility: Object.fromEntries(RIG_COLUMNS.map((c) => [c.id, v.columns.includes(c.id)])),
    filter: "",
    selection: {},
  };
}

export function RigWorkspace(props: Props) {
  const { productionId, units, rights } = props;
  const router = useRouter();
  const pathname = usePathname();
  const fixtures = useRigFixtures(productionId, props.initialFixtures).data ?? [];
  const types = useRigTypes(productionId, props.initialTypes).data ?? [];
  const typeWeights = useMemo(() => new Map(types.map((t) => [t.id, t.weightKg])), [types]);
  const accessories = useRigAccessories(productionId, props.initialAccessories).data ?? [];
  const [view, setView] = useState<RigViewId>(props.initialView);
  const [state, setState] = useState<TableState>(() => stateFor(props.initialView));
  const [panel, setPanel] = useState<"import" | "types" | "accessories" | null>(null);
  const choices = useMemo(
    () => ({ position: props.positions, type: types.map((t) => ({ id: t.id, name: t.name })) }),
    [props.positions, types],
  );

  function chooseView(id: RigViewId) {
    setView(id);
    setState(stateFor(id));
    router.replace(`${pathname}?view=${id}`, { scroll: false });
  }

  const visibleColumns = RIG_COLUMNS.filter((c) => state.visibility[c.id] !== false).map((c) => c.id);
  const exportHref = (format: "csv" | "xlsx", which: string = view) =>
    `/api/productions/${productionId}/export?view=${which}&format=${format}${which === view && view !== "stock" ? `&columns=${visibleColumns.join(",")}` : ""}`;
  const selectedIds = Object.keys(state.selection)
    .filter((k) => state.selection[k])
    .map(Number);
  const bulkAllowed = rights.canPlot || rights.canElectrics;
  const current = VIEW_BY_ID.get(view)!;
  const deletion = useRigDelete(productionId);
  const { undoLast, undoLabel, remove } = deletion;
  // Stable while nothing changes, so the table does not rebuild its columns on every render.
  const onDelete = useMemo(
    () => (rights.canPlot ? (f: FixtureDto) => void remove([f]) : undefined),
    [rights.canPlot, remove],
  );

  // Ctrl/Cmd+Z undoes the last delete, as on the plot, unless the keys belong to a field being typed in.
  useEffect(() => {
    if (!undoLabel) return;
    const onKey = (e: KeyboardEvent) => {
      const t = e.target as HTMLElement | null;
      if (t?.closest("input, textarea, select, [contenteditable=true]")) return;
      if ((e.ctrlKey || e.metaKey) && !e.shiftKey && e.key.toLowerCase() === "z") {
        e.preventDefault();
        void undoLast();
      }
    };
    window.addEventListener("keydown", onKey);
    return () => window.removeEventListener("keydown", onKey);
  }, [undoLabel, undoLast]);

  // A panel that closes gives the focus back to the button that opened it (keyboard users stay in place).
  const opener = useRef<HTMLElement | null>(null);
  function togglePanel(which: NonNullable<typeof panel>, from: HTMLElement) {
    opener.current = from;
    setPanel(panel === which ? null : which);
  }
  function closePanel() {
    setPanel(null);
    requestAnimationFrame(() => opener.current?.focus());
  }

  return (
    <main className="flex flex-col gap-3 px-4 py-4 print:p-0">
      <h1 className="hidden text-base font-semibold print:block">
        {props.productionName} — rig, {current.label.toLowerCase()}
      </h1>
      <nav aria-label="Rig views" className="flex flex-wrap gap-1 print:hidden">
        {RIG_VIEWS.map((v) => (
          <button
            key={v.id}
            type="button"
            aria-pressed={v.id === view}
            onClick={() => chooseView(v.id)}
            className={`min-h-10 rounded-md border px-3 py-1.5 text-sm pointer-coarse:min-h-11 ${v.id === view ? "border-accent bg-accent text-accent-ink" : "border-line bg-surface hover:bg-raised"}`}
          >
            {v.label}
          </button>
        ))}
      </nav>
      <p className="text-sm text-muted print:hidden">{current.description}</p>

      <div className="flex flex-wrap items-center gap-2 print:hidden">
        {view !== "stock" ? (
          <>
            <input
              type="search"
              aria-label="Filter fixtures"
              placeholder="Filter: position, colour, purpose …"
              value={state.filter}
              onChange={(e) => setState((s) => ({ ...s, filter: e.target.value }))}
              className="min-h-10 w-64 rounded-md border border-line bg-surface px-3 text-sm"
            />
            <label className="flex items-center gap-1 text-sm">
              <input
                type="checkbox"
                checked={state.grouping.length > 0}
                onChange={(e) => setState((s) => ({ ...s, grouping: e.target.checked ? ["position"] : [] }))}
              />
              Group by position
            </label>
            <ColumnChooser
              visibility={state.visibility}
              onChange={(visibility) => setState((s) => ({ ...s, visibility }))}
            />
          </>
        ) : null}
        <span className="grow" />
        <Button variant="secondary" onClick={() => window.print()}>
          Print
        </Button>
        <a
          className="inline-flex min-h-10 items-center rounded-md border border-line bg-surface px-3 text-sm hover:bg-raised"
          href={exportHref("csv")}
          download
        >
          Export CSV
        </a>
        <a
          className="inline-flex min-h-10 items-center rounded-md border border-line bg-surface px-3 text-sm hover:bg-raised"
          href={exportHref("xlsx")}
          download
          data-testid="export-xlsx"
        >
          Export .xlsx
        </a>
        <a
          className="inline-flex min-h-10 items-center rounded-md border border-line bg-surface px-3 text-sm hover:bg-raised"
          href={exportHref("xlsx", "workbook")}
          download
        >
          Whole workbook
        </a>
        <Button
          variant="secondary"
          aria-expanded={panel === "types"}
          onClick={(e) => togglePanel("types", e.currentTarget)}
        >
          Fixture types
        </Button>
        <Button
          variant="secondary"
          aria-expanded={panel === "accessories"}
          onClick={(e) => togglePanel("accessories", e.currentTarget)}
        >
          Accessories
        </Button>
        {rights.canImport ? (
          <Button aria-expanded={panel === "import"} onClick={(e) => togglePanel("import", e.currentTarget)}>
            Import a file
          </Button>
        ) : null}
      </div>

      {panel === "import" ? <ImportPanel productionId={productionId} units={units} onClose={closePanel} /> : null}
      {panel === "accessories" ? (
        <AccessoriesPanel
          productionId={productionId}
          fixtures={fixtures}
          accessories={accessories}
          canEdit={rights.canElectrics}
          onClose={closePanel}
        />
      ) : null}
      {panel === "types" ? (
        <TypesPanel
          productionId={productionId}
          types={types}
          canAdd={rights.canPlot}
          editableFields={rights.typeFields}
          units={units}
          onClose={closePanel}
        />
      ) : null}

      {view === "stock" ? (
        <StockPanel fixtures={fixtures} types={types} accessories={accessories} />
      ) : (
        <>
          {bulkAllowed && selectedIds.length ? (
            <BulkBar
              productionId={productionId}
              fixtures={fixtures}
              selectedIds={selectedIds}
              canPlot={rights.canPlot}
              canElectrics={rights.canElectrics}
              onDone={() => setState((s) => ({ ...s, selection: {} }))}
            />
          ) : null}
          <p className="text-xs text-muted print:hidden">
            {fixtures.length} fixtures. Lengths in {units === "metric" ? "metres" : "feet and inches"}; grey italic
            columns are computed from the beam model.
            {rights.editable.length ? " Click a value to change it." : " Your role can read the rig but not change it."}
          </p>
          {deletion.notice || deletion.undoLabel ? (
            <div
              className="flex flex-wrap items-center gap-2 rounded-lg border border-line bg-surface px-3 py-2 text-sm print:hidden"
              data-testid="rig-undo-bar"
            >
              <span
                role={deletion.notice?.tone === "error" ? "alert" : "status"}
                className={deletion.notice?.tone === "error" ? "text-danger" : ""}
              >
                {deletion.notice?.text}
              </span>
              <span className="grow" />
              {deletion.undoLabel ? (
                <Button
                  variant="secondary"
                  disabled={deletion.busy}
                  onClick={() => void deletion.undoLast()}
                  title="Ctrl+Z (⌘Z)"
                >
                  Undo: {deletion.undoLabel.charAt(0).toLowerCase() + deletion.undoLabel.slice(1)}
                </Button>
              ) : null}
            </div>
          ) : null}
          <RigTable
            onDelete={onDelete}
            fixtures={fixtures}
            units={units}
            typeWeights={typeWeights}
            productionId={productionId}
            editable={rights.editable}
            selectable={bulkAllowed}
            choices={choices}
            state={state}
            onState={(p) => setState((s) => ({ ...s, ...p }))}
          />
        </>
      )}
    </main>
  );
}
