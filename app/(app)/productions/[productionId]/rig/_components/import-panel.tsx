"use client";

import { useState } from "react";
import type { ImportPreview } from "@/lib/dto/import";
import { IMPORT_FIELDS, type ColumnTarget } from "@/lib/io/fields";
import type { Units } from "@/lib/rig/columns";
import { ApiError } from "@/lib/http/api-client";
import { useRigImport, type ImportOptions } from "@/hooks/use-rig-import";
import { Button } from "@/components/ui/button";
import { ImportPreviewTable } from "./import-preview-table";
import { ImportChanges } from "./import-changes";

/** Upload → preview and map → every row checked → one all-or-nothing commit with a progress bar. */
export function ImportPanel({
  productionId,
  units,
  onClose,
}: {
  productionId: number;
  units: Units;
  onClose: () => void;
}) {
  const { preview, commit, progress } = useRigImport(productionId);
  const [file, setFile] = useState<File | null>(null);
  const [checked, setChecked] = useState<ImportPreview | null>(null);
  const [options, setOptions] = useState<ImportOptions>({ createMissing: false });
  const [problem, setProblem] = useState<string | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function check(f: File, opts: ImportOptions) {
    setBusy(true);
    setProblem(null);
    setDone(null);
    try {
      const p = await preview(f, opts);
      setChecked(p);
      setOptions({ ...opts, mapping: p.mapping, lengthUnit: p.lengthUnit, sheet: p.sheet ?? undefined });
    } catch (err) {
      setChecked(null);
      setProblem(err instanceof ApiError ? err.message : "The file could not be checked.");
    } finally {
      setBusy(false);
    }
  }

  function change(patch: Partial<ImportOptions>) {
    const next = { ...options, ...patch };
    setOptions(next);
    if (file) void check(file, next);
  }

  async function run() {
    if (!file || !checked) return;
    setBusy(true);
    setProblem(null);
    try {
      const r = await commit(file, options);
      setDone(`Imported: ${r.counts.create} new, ${r.counts.update} updated, ${r.counts.unchanged} unchanged.`);
      setChecked(null);
    } catch (err) {
      setProblem(err instanceof ApiError ? err.message : "The import failed; nothing was written.");
    } finally {
      setBusy(false);
    }
  }

  const ready = checked && checked.errorCount === 0 && checked.counts.create + checked.counts.update > 0;
  return (
    <section
      className="flex flex-col gap-3 rounded-lg border border-line bg-surface p-4 print:hidden"
      aria-label="Import a rig file"
      data-testid="import-panel"
    >
      <header className="flex items-center justify-between">
        <h2 className="font-semibold">Import fixtures from CSV or Excel (.xlsx)</h2>
        <Button variant="quiet" onClick={onClose}>
          Close
        </Button>
      </header>
      <p className="text-xs text-muted">
        Rows are matched to fixtures by position and unit number: a match is updated, anything else is added. Nothing is
        written until every row checks out, and then all rows are written together. The electrician may change electrics
        only (circuit, dimmer, universe, address, mode, footprint, type, hung, focused, as-focused notes); rows that
        would change anything else are refused by name.
      </p>
      <label className="flex flex-col gap-1 text-sm">
        <span className="font-medium">File</span>
        <input
          type="file"
          accept=".csv,.txt,.xlsx,text/csv,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet"
          data-testid="import-file"
          onChange={(e) => {
            const f = e.target.files?.[0] ?? null;
            setFile(f);
            const fresh = { createMissing: options.createMissing };
            setOptions(fresh);
            if (f) void check(f, fresh);
            e.target.value = "";
          }}
        />
      </label>
      {busy && !progress ? (
        <p role="status" className="text-sm">
          Checking {file?.name}…
        </p>
      ) : null}
      {problem ? (
        <p
          role="alert"
          className="rounded-md border border-danger p-2 text-sm text-danger"
          data-testid="import-problem"
        >
          {problem}
        </p>
      ) : null}
      {done ? (
        <p
          role="status"
          className="rounded-md border border-success p-2 text-sm text-success"
          data-testid="import-done"
        >
          {done}
        </p>
      ) : null}
      {progress ? (
        <div className="flex flex-col gap-1 text-sm">
          <span data-testid="import-stage">
            {progress.stage === "writing"
              ? `Writing ${progress.done} of ${progress.total} rows…`
              : progress.stage === "checking"
                ? `Checking rows: ${progress.done} of ${progress.total}…`
                : progress.stage === "uploading"
                  ? "Sending the file…"
                  : "Reading the file…"}
          </span>
          <progress
            className="h-2 w-full accent-[var(--accent)]"
            max={Math.max(progress.total, 1)}
            value={progress.done}
            aria-label="Import progress"
          />
        </div>
      ) : null}

      {checked ? (
        <>
          <div className="flex flex-wrap items-end gap-3 text-sm">
            <span className="self-center">
              {checked.fileName}: {checked.rowCount} rows{checked.sheet ? `, sheet "${checked.sheet}"` : ""}
            </span>
            {checked.sheetNames.length > 1 ? (
              <label className="flex flex-col gap-1">
                <span>Sheet</span>
                <select
                  className="min-h-10 rounded-md border border-line bg-surface px-2"
                  value={checked.sheet ?? ""}
                  onChange={(e) => change({ sheet: e.target.value, mapping: undefined })}
                >
                  {checked.sheetNames.map((s) => (
                    <option key={s}>{s}</option>
                  ))}
                </select>
              </label>
            ) : null}
            <label className="flex flex-col gap-1">
              <span>Plain numbers in length columns are</span>
              <select
                className="min-h-10 rounded-md border border-line bg-surface px-2"
                value={options.lengthUnit ?? (units === "imperial" ? "ft" : "m")}
                onChange={(e) => change({ lengthUnit: e.target.value as "m" | "ft" })}
              >
                <option value="m">metres</option>
                <option value="ft">feet</option>
              </select>
            </label>
            <label className="flex items-center gap-1 self-center">
              <input
                type="checkbox"
                checked={options.createMissing}
                onChange={(e) => change({ createMissing: e.target.checked })}
              />
              Create positions and types that do not exist yet
            </label>
          </div>
          {checked.notes.map((n) => (
            <p key={n} className="text-xs text-caution">
              {n}
            </p>
          ))}
          <ImportPreviewTable
            preview={checked}
            fields={IMPORT_FIELDS}
            onMap={(i, target: ColumnTarget) =>
              change({ mapping: checked.mapping.map((m, j) => (j === i ? target : m)) })
            }
          />
          <p className="text-sm" data-testid="import-summary">
            {checked.counts.create} new, {checked.counts.update} to update, {checked.counts.unchanged} unchanged
            {checked.newPositions.length ? `; new positions: ${checked.newPositions.join(", ")}` : ""}
            {checked.newTypes.length ? `; new types: ${checked.newTypes.join(", ")}` : ""}.
          </p>
          <ImportChanges preview={checked} />
          {checked.errorCount ? (
            <div className="rounded-md border border-danger p-2" data-testid="import-errors">
              <p className="text-sm font-semibold text-danger">
                {checked.errorCount} problem{checked.errorCount === 1 ? "" : "s"} to fix before anything is imported:
              </p>
              <ul className="mt-1 max-h-56 overflow-y-auto text-sm">
                {checked.errors.map((e, i) => (
                  <li key={i}>
                    Row {e.row}, {e.column}: {e.message}
                  </li>
                ))}
              </ul>
              {checked.errorCount > checked.errors.length ? (
                <p className="text-xs text-muted">…and {checked.errorCount - checked.errors.length} more.</p>
              ) : null}
            </div>
          ) : null}
          <div>
            <Button onClick={run} disabled={!ready || busy} data-testid="import-commit">
              Import {checked.counts.create + checked.counts.update} row
              {checked.counts.create + checked.counts.update === 1 ? "" : "s"}
            </Button>
          </div>
        </>
      ) : null}
    </section>
  );
}
