"use client";

import { useState } from "react";
import type { FixtureTypeDto } from "@/lib/dto/fixture-type";
import { STARTER_TYPES } from "@/lib/rig/starter-types";
import { TYPE_COLUMNS } from "@/lib/rig/type-fields";
import { TypeCell } from "./type-cell";
import type { Units } from "@/lib/rig/columns";
import { ApiError } from "@/lib/http/api-client";
import { useAddStarterTypes } from "@/hooks/use-rig";
import { Button } from "@/components/ui/button";

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
  const add = useAddStarterTypes(productionId);
  const [message, setMessage] = useState<string | null>(null);
  const have = new Set(types.map((t) => t.name.toLowerCase()));
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
          <h3 className="text-sm font-semibold">Starter shelf</h3>
          <p className="text-xs text-muted">
            Generic types with typical figures from memory — no brand and not a data sheet. Replace the figures with
            those of your own units.
          </p>
          <div className="mt-2 flex flex-wrap gap-2">
            {STARTER_TYPES.filter((t) => !have.has(t.name.toLowerCase())).map((t) => (
              <Button
                key={t.name}
                variant="secondary"
                disabled={add.isPending}
                onClick={() =>
                  add.mutateAsync([t.name]).then(
                    () => setMessage(`Added ${t.name}.`),
                    (e) => setMessage(e instanceof ApiError ? e.message : "Could not add."),
                  )
                }
              >
                + {t.name}
              </Button>
            ))}
          </div>
          {message ? (
            <p role="status" className="mt-2 text-sm">
              {message}
            </p>
          ) : null}
        </div>
      ) : null}
    </section>
  );
}
