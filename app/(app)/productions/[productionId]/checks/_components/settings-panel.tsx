"use client";
// The electrical code (which sets the supply's default and the continuous-load factor), the supply
// system, and the rigging allowances. Display units never choose any of these.
import { useState } from "react";
import { Button } from "@/components/ui/button";
import {
  CODE_INFO,
  ELECTRICAL_CODES,
  SUPPLY_INFO,
  SUPPLY_SYSTEMS,
  type ElectricalCode,
  type SupplySystem,
} from "@/lib/checks/electrical";
import type { ElectricalSettingsDto } from "@/lib/dto/checks";
import { ApiError } from "@/lib/http/api-client";
import { sendSettings, useChecksWrite } from "./use-checks";

export function SettingsPanel({
  productionId,
  settings,
  canEdit,
}: {
  productionId: number;
  settings: ElectricalSettingsDto;
  canEdit: boolean;
}) {
  const save = useChecksWrite(productionId, sendSettings);
  const [code, setCode] = useState<ElectricalCode>(settings.electricalCode);
  const [supply, setSupply] = useState<SupplySystem>(settings.supplySystem);
  const [voltage, setVoltage] = useState(String(settings.voltage));
  const [factor, setFactor] = useState(settings.derating == null ? "" : String(Math.round(settings.derating * 100)));
  const [cable, setCable] = useState(String(settings.cableKgPerM));
  const [hardware, setHardware] = useState(String(settings.hardwareKgPerUnit));
  const e = save.error instanceof ApiError ? save.error : null;
  const fieldErr = (f: string) => e?.fieldErrors[f]?.join(" ");
  const codeDefault = CODE_INFO[code].defaultDerating;
  const input = "min-h-10 rounded-md border border-line bg-surface px-2";
  return (
    <form
      className="grid gap-3 sm:grid-cols-3"
      onSubmit={(ev) => {
        ev.preventDefault();
        save.mutate({
          version: settings.version,
          electricalCode: code,
          supplySystem: supply,
          voltage: Number(voltage),
          derating: factor.trim() ? Number(factor) / 100 : null,
          cableKgPerM: Number(cable),
          hardwareKgPerUnit: Number(hardware),
        });
      }}
    >
      <fieldset disabled={!canEdit || save.isPending} className="contents">
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Electrical code</span>
          <select
            className={input}
            value={code}
            onChange={(ev) => {
              const c = ev.target.value as ElectricalCode;
              setCode(c);
              setSupply(CODE_INFO[c].defaultSupply);
            }}
          >
            {ELECTRICAL_CODES.map((c) => (
              <option key={c} value={c}>
                {CODE_INFO[c].label}
              </option>
            ))}
          </select>
          <span className="text-xs text-muted">{CODE_INFO[code].note}</span>
        </label>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Supply system</span>
          <select className={input} value={supply} onChange={(ev) => setSupply(ev.target.value as SupplySystem)}>
            {SUPPLY_SYSTEMS.map((s) => (
              <option key={s} value={s}>
                {SUPPLY_INFO[s].label}
              </option>
            ))}
          </select>
        </label>
        {supply === "by-hand" ? (
          <label className="flex flex-col gap-1 text-sm">
            <span className="font-medium">Volts per circuit (phase to neutral)</span>
            <input
              className={input}
              name="voltage"
              inputMode="numeric"
              value={voltage}
              onChange={(ev) => setVoltage(ev.target.value)}
              aria-invalid={!!fieldErr("voltage") || undefined}
            />
            <span className="text-xs text-danger" aria-live="polite">
              {fieldErr("voltage")}
            </span>
          </label>
        ) : (
          <span className="self-end text-sm text-muted">{SUPPLY_INFO[supply].lineToNeutral} V per circuit</span>
        )}
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Continuous-load factor (%)</span>
          <input
            className={input}
            name="derating"
            inputMode="decimal"
            value={factor}
            placeholder={codeDefault == null ? "none" : `code default ${codeDefault * 100}`}
            onChange={(ev) => setFactor(ev.target.value)}
            aria-invalid={!!fieldErr("derating") || undefined}
          />
          <span className="text-xs text-muted">
            Leave empty for the code&apos;s default{codeDefault == null ? " (none)" : ` (${codeDefault * 100} %)`}.
          </span>
          <span className="text-xs text-danger" aria-live="polite">
            {fieldErr("derating")}
          </span>
        </label>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Cable weight (kg per metre of pipe)</span>
          <input
            className={input}
            name="cableKgPerM"
            inputMode="decimal"
            value={cable}
            onChange={(ev) => setCable(ev.target.value)}
          />
          <span className="text-xs text-danger" aria-live="polite">
            {fieldErr("cableKgPerM")}
          </span>
        </label>
        <label className="flex flex-col gap-1 text-sm">
          <span className="font-medium">Hardware per unit (kg: clamp, safety)</span>
          <input
            className={input}
            name="hardwareKgPerUnit"
            inputMode="decimal"
            value={hardware}
            onChange={(ev) => setHardware(ev.target.value)}
          />
          <span className="text-xs text-danger" aria-live="polite">
            {fieldErr("hardwareKgPerUnit")}
          </span>
        </label>
      </fieldset>
      {canEdit ? (
        <div className="flex items-center gap-3 sm:col-span-3">
          <Button type="submit" disabled={save.isPending}>
            Save
          </Button>
          {e ? (
            <span className="text-sm text-danger" aria-live="polite">
              {e.status === 409 ? "Someone changed these settings first; the page now shows theirs." : e.message}
            </span>
          ) : save.isSuccess ? (
            <span className="text-sm text-success">Saved.</span>
          ) : null}
        </div>
      ) : null}
    </form>
  );
}
