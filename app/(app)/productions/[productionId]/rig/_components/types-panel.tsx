"use client";

import type { FixtureTypeDto } from "@/lib/dto/fixture-type";
import { TYPE_COLUMNS } from "@/lib/rig/type-fields";
import { TypeCell } from "./type-cell";
import type { Units } from "@/lib/rig/columns";
import { Button } from "@/components/ui/button";
import { AddTypes } from "@/components/rig/add-types";

/** The production's fixture types (figures editable per the role table), and the generic starter shelf the designer can add from. */
export function TypesPanel({
  productionId,
  types,
  canAdd,
  editableFields,
  units,
  onClose,
}: {
  productionId: number;
  types: FixtureTypeDto[];
  canAdd: boolean;
  editableFields: string[];
  units: Units;
  onClose: () => void;
}) {
  const editable = new Set(editableFields);
  return (
    <section className="rounded-lg border border-line bg-surface p-4 print:hidden" aria-label="Fixture types">
      <header className="mb-2 flex items-center justify-between">
        <h2 className="font-semibold">Fixture types in this production</h2>
        <Button variant="quiet" onClick={onClose}>
          Close
        </Button>
      </header>
      <p className="mb-2 text-xs text-muted" data-testid="types-from-memory">
        Starter figures are typical values from memory for generic units, not a maker&apos;s data sheet. Check them
        against your own units; every fixture&apos;s pool and throw follow its type as soon as a figure changes.
      </p>
      <p className="mb-2 text-xs text-muted" data-testid="types-rights">
        {editable.size === 0
          ? "Your role can read these figures but not change them."
          : TYPE_COLUMNS.every((c) => c.kind === "readOnly" || c.fields.every((f) => editable.has(f)))
            ? "Outlined figures can be changed: click one to type."
            : `Outlined figures can be changed (${TYPE_COLUMNS.filter(
                (c) => c.kind !== "readOnly" && c.fields.every((f) => editable.has(f)),
              )
                .map((c) => c.header.replace(/ \(.*\)$/, "").toLowerCase())
                .join(", ")}); the rest are the designer's.`}
      </p>
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <thead>
            <tr>
              {TYPE_COLUMNS.map((c) => (
                <th key={c.key} scope="col" className="border-b border-line py-1 pr-2 text-left text-xs">
                  {c.header}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {types.map((t) => (
              <tr key={t.id} className="border-b border-line/50 align-middle">
                {TYPE_COLUMNS.map((c) => (
                  <td key={c.key} className="py-1 pr-2">
                    <TypeCell
                      productionId={productionId}
                      type={t}
                      column={c}
                      units={units}
                      editable={c.kind !== "readOnly" && c.fields.every((f) => editable.has(f))}
                    />
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {canAdd ? (
        <div className="mt-3">
          <AddTypes productionId={productionId} existingNames={types.map((t) => t.name)} />
        </div>
      ) : null}
    </section>
  );
}
