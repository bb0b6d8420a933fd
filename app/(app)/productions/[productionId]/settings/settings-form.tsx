"use client";

import { useActionState, useState } from "react";
import { updateSettingsAction } from "./actions";
import type { ProductionDto } from "@/lib/dto/production";
import { fieldError, IDLE, typedValue } from "@/lib/http/action-state";
import { formatLength } from "@/lib/optics";
import { Card } from "@/components/ui/card";
import { TextField } from "@/components/ui/text-field";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

const LENGTHS: Array<[keyof ProductionDto, string, string]> = [
  ["prosceniumWidth", "Proscenium width", "Opening, wall to wall"],
  ["prosceniumHeight", "Proscenium height", ""],
  ["stageWidth", "Stage width", "Wing to wing"],
  ["stageDepth", "Stage depth", "From the datum line upstage"],
  ["apronDepth", "Apron depth", "Downstage of the datum line"],
  ["backWallY", "Back-wall depth", "Datum line to the back wall"],
  ["headHeight", "Head height", "For focusing to head height"],
  ["faceHeight", "Face height", "Where the coverage study measures light on faces, above the deck"],
  ["showDeckHeight", "Show-deck height", "A show deck's top above the stage floor; studies measure from it (0 = none)"],
];

// Common practice, no source: 1.7–1.8 m, or 5'6"–6'0" (REFERENCE.md), said in the production's units.
const HEAD_HEIGHT_PRACTICE = { metric: "common practice 1.7–1.8 m", imperial: `common practice 5' 6"–6' 0"` };

type SettingsState = Awaited<ReturnType<typeof updateSettingsAction>>;

export function SettingsForm({ production: initial, canEdit }: { production: ProductionDto; canEdit: boolean }) {
  const [production, setProduction] = useState(initial);
  const [state, action, pending] = useActionState<SettingsState, FormData>(async (prev, form) => {
    const next = await updateSettingsAction(initial.id, prev, form);
    // Saved, or refused because someone else saved first (409): show the row as it is now.
    const now =
      next.status === "ok"
        ? next.production
        : next.status === "error"
          ? (next.current as ProductionDto | undefined)
          : undefined;
    if (now) setProduction(now);
    return next;
  }, IDLE);
  const units = production.displayUnits;
  const err = (f: string) => fieldError(state, f);
  // After a refused save, show what was typed rather than the stored value.
  const typed = (f: string, stored: string | number) => typedValue(state, f) ?? String(stored);
  return (
    <form action={action} key={production.version} className="flex flex-col gap-4" noValidate>
      <input type="hidden" name="version" value={production.version} />
      <fieldset disabled={!canEdit || pending} className="flex flex-col gap-4">
        <Card title="Production">
          <div className="grid gap-3 sm:grid-cols-2">
            <TextField label="Name" name="name" defaultValue={typed("name", production.name)} error={err("name")} />
            <TextField
              label="Venue"
              name="venue"
              defaultValue={typed("venue", production.venue)}
              error={err("venue")}
            />
            <label className="flex flex-col gap-1 text-sm">
              <span className="font-medium">Display units</span>
              <select
                name="displayUnits"
                defaultValue={units}
                className="min-h-10 rounded-md border border-line bg-surface px-3"
              >
                <option value="metric">Metric (m)</option>
                <option value="imperial">Imperial (ft and in)</option>
              </select>
            </label>
            <TextField
              label="Datum line name"
              name="datumName"
              defaultValue={typed("datumName", production.datumName)}
              hint="e.g. setting line, plaster line, stage edge"
              error={err("datumName")}
            />
          </div>
        </Card>
        <Card title="Stage outline">
          <p className="mb-3 text-xs text-muted">
            Type lengths as 3.2, 3.2 m, 320 cm, 10&apos;6&quot;, 10&apos; 6 1/2&quot; or 126&quot;.
          </p>
          <div className="grid gap-3 sm:grid-cols-3">
            {LENGTHS.map(([field, label, hint]) => (
              <TextField
                key={field}
                label={label}
                name={field}
                hint={(field === "headHeight" ? `${hint} (${HEAD_HEIGHT_PRACTICE[units]})` : hint) || undefined}
                defaultValue={typed(field, formatLength(production[field] as number, units))}
                error={err(field)}
              />
            ))}
          </div>
        </Card>
        <Card title="Power and numbering">
          <div className="grid gap-3 sm:grid-cols-3">
            <p className="text-sm text-muted sm:col-span-2" data-testid="settings-electrical">
              The electrical code, supply system and voltage, and the continuous-load factor are chosen with the{" "}
              <a className="underline" href={`/productions/${production.id}/checks`}>
                checks
              </a>
              : the code sets the defaults, never the display units.
            </p>
            <label className="flex flex-col gap-1 text-sm">
              <span className="font-medium">Unit numbers on overhead positions run</span>
              <select
                name="numberingRule"
                defaultValue={production.numberingRule}
                className="min-h-10 rounded-md border border-line bg-surface px-3"
              >
                <option value="from-stage-left">from stage left</option>
                <option value="from-stage-right">from stage right</option>
              </select>
            </label>
          </div>
        </Card>
      </fieldset>
      <div className="flex items-center gap-4">
        {canEdit ? (
          <Button type="submit" disabled={pending}>
            {pending ? "Saving…" : "Save settings"}
          </Button>
        ) : (
          <p className="text-sm text-muted">Only the designer can change these settings.</p>
        )}
        <FormMessage
          message={state.status === "idle" ? undefined : state.message}
          tone={state.status === "ok" ? "ok" : "error"}
        />
      </div>
    </form>
  );
}
