"use client";

import { useState } from "react";
import type { AccessoryDto } from "@/lib/dto/accessory";
import type { FixtureDto } from "@/lib/dto/fixture";
import { ACCESSORY_KINDS } from "@/lib/validation/accessory";
import {
  ACCESSORY_FIELDS,
  EMPTY_ACCESSORY,
  accessoryText,
  readAccessory,
  type AccessoryKey,
  type AccessoryText,
} from "@/lib/rig/accessory-form";
import { ApiError } from "@/lib/http/api-client";
import { useAccessoryMutations } from "@/hooks/use-rig-accessories";
import { Button } from "@/components/ui/button";

type Errors = Partial<Record<AccessoryKey | "fixtureId" | "form", string>>;
const unitName = (f: FixtureDto) => `Unit ${f.unitNumber} on ${f.positionName}`;
const fromApi = (err: unknown): Errors =>
  err instanceof ApiError
    ? { ...Object.fromEntries(Object.entries(err.fieldErrors).map(([k, v]) => [k, v[0]])), form: err.message }
    : { form: "Could not save." };

/** Accessories hung on fixtures (scrollers, irises …) with their own DMX, power and weight; electrics edit them. */
export function AccessoriesPanel({
  productionId,
  fixtures,
  accessories,
  canEdit,
  onClose,
}: {
  productionId: number;
  fixtures: FixtureDto[];
  accessories: AccessoryDto[];
  canEdit: boolean;
  onClose: () => void;
}) {
  const m = useAccessoryMutations(productionId);
  const byId = new Map(fixtures.map((f) => [f.id, f]));
  const [editing, setEditing] = useState<{ id: number; text: AccessoryText; errors: Errors } | null>(null);
  const [draft, setDraft] = useState<{ fixtureId: string; text: AccessoryText; errors: Errors }>({
    fixtureId: "",
    text: EMPTY_ACCESSORY,
    errors: {},
  });
  const [status, setStatus] = useState<string | null>(null);

  async function add() {
    const read = readAccessory(draft.text);
    const errors: Errors = read.ok ? {} : { ...read.errors };
    if (!draft.fixtureId) errors.fixtureId = "Choose the fixture it hangs on";
    if (!read.ok || errors.fixtureId) return setDraft({ ...draft, errors });
    try {
      await m.create.mutateAsync({ ...read.values, fixtureId: Number(draft.fixtureId) });
      setDraft({ fixtureId: draft.fixtureId, text: EMPTY_ACCESSORY, errors: {} });
      setStatus(`Added a ${read.values.kind}.`);
    } catch (err) {
      setDraft({ ...draft, errors: fromApi(err) });
    }
  }

  async function save(a: AccessoryDto) {
    if (!editing) return;
    const read = readAccessory(editing.text);
    if (!read.ok) return setEditing({ ...editing, errors: read.errors });
    try {
      await m.update.mutateAsync({ id: a.id, patch: { ...read.values, version: a.version } });
      setEditing(null);
      setStatus(`Saved the ${read.values.kind}.`);
    } catch (err) {
      if (err instanceof ApiError && err.status === 409) {
        setEditing(null);
        setStatus(
          `Someone else changed this ${a.kind} first; the list now shows their version. Your edit was not saved.`,
        );
      } else setEditing({ ...editing, errors: fromApi(err) });
    }
  }

  const field = (
    key: AccessoryKey,
    text: AccessoryText,
    errors: Errors,
    onChange: (t: AccessoryText) => void,
    label: string,
  ) => (
    <label key={key} className="flex flex-col gap-0.5 text-xs">
      <span className="font-medium">{ACCESSORY_FIELDS.find((f) => f.key === key)!.label}</span>
      <input
        aria-label={label}
        list={key === "kind" ? "accessory-kinds" : undefined}
        value={text[key]}
        aria-invalid={errors[key] ? true : undefined}
        onChange={(e) => onChange({ ...text, [key]: e.target.value })}
        className={`min-h-8 rounded border border-line bg-surface px-2 text-sm text-ink aria-invalid:border-danger ${key === "notes" || key === "kind" ? "w-36" : "w-20"}`}
      />
      {errors[key] ? (
        <span role="alert" className="max-w-40 text-danger">
          {errors[key]}
        </span>
      ) : null}
    </label>
  );

  return (
    <section className="rounded-lg border border-line bg-surface p-4 print:hidden" aria-label="Accessories">
      <header className="mb-2 flex items-center justify-between">
        <h2 className="font-semibold">Accessories on fixtures</h2>
        <Button variant="quiet" onClick={onClose}>
          Close
        </Button>
      </header>
      <datalist id="accessory-kinds">
        {ACCESSORY_KINDS.map((k) => (
          <option key={k} value={k} />
        ))}
      </datalist>
      <p className="mb-2 text-xs text-muted">
        Power and weight here add to the fixture&apos;s when loads are counted. Loads on a position are for the
        production electrician and the venue&apos;s qualified people to confirm against local codes.
      </p>
      {accessories.length === 0 ? (
        <p className="text-sm text-muted">No accessories yet.</p>
      ) : (
        <div className="overflow-x-auto">
          <table className="w-full text-sm" data-testid="accessories-table">
            <thead>
              <tr>
                {["Fixture", ...ACCESSORY_FIELDS.map((f) => f.label), ""].map((h, i) => (
                  <th key={i} scope="col" className="border-b border-line py-1 pr-2 text-left text-xs">
                    {h}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {accessories.map((a) => {
                const f = byId.get(a.fixtureId);
                const name = f ? unitName(f) : `fixture ${a.fixtureId}`;
                if (editing?.id === a.id) {
                  return (
                    <tr key={a.id} className="border-b border-line/50 align-top">
                      <td className="py-1 pr-2">{name}</td>
                      <td colSpan={ACCESSORY_FIELDS.length + 1} className="py-1">
                        <div className="flex flex-wrap items-end gap-2">
                          {ACCESSORY_FIELDS.map((fd) =>
                            field(
                              fd.key,
                              editing.text,
                              editing.errors,
                              (text) => setEditing({ ...editing, text }),
                              `${fd.label} of the ${a.kind} on ${name}`,
                            ),
                          )}
                          <Button onClick={() => void save(a)} disabled={m.update.isPending}>
                            Save
                          </Button>
                          <Button variant="quiet" onClick={() => setEditing(null)}>
                            Cancel
                          </Button>
                        </div>
                        {editing.errors.form ? (
                          <p role="alert" className="text-xs text-danger">
                            {editing.errors.form}
                          </p>
                        ) : null}
                      </td>
                    </tr>
                  );
                }
                const t = accessoryText(a);
                return (
                  <tr key={a.id} className="border-b border-line/50 align-top" data-testid="accessory-row">
                    <td className="py-1 pr-2">{name}</td>
                    {ACCESSORY_FIELDS.map((fd) => (
                      <td key={fd.key} className="py-1 pr-2">
                        {t[fd.key] || "—"}
                      </td>
                    ))}
                    <td className="whitespace-nowrap py-1">
                      {canEdit ? (
                        <>
                          <Button
                            variant="quiet"
                            aria-label={`Edit the ${a.kind} on ${name}`}
                            onClick={() => setEditing({ id: a.id, text: t, errors: {} })}
                          >
                            Edit
                          </Button>
                          <Button
                            variant="quiet"
                            aria-label={`Remove the ${a.kind} on ${name}`}
                            disabled={m.remove.isPending}
                            onClick={() =>
                              m.remove.mutateAsync(a.id).then(
                                () => setStatus(`Removed the ${a.kind} from ${name}.`),
                                (e) => setStatus(fromApi(e).form ?? null),
                              )
                            }
                          >
                            Remove
                          </Button>
                        </>
                      ) : null}
                    </td>
                  </tr>
                );
              })}
            </tbody>
          </table>
        </div>
      )}
      {canEdit ? (
        <div className="mt-3 flex flex-wrap items-end gap-2" data-testid="accessory-add">
          <label className="flex flex-col gap-0.5 text-xs">
            <span className="font-medium">Fixture</span>
            <select
              aria-label="Fixture for the new accessory"
              value={draft.fixtureId}
              onChange={(e) => setDraft({ ...draft, fixtureId: e.target.value })}
              className="min-h-8 max-w-52 rounded border border-line bg-surface px-2 text-sm text-ink"
            >
              <option value="">Choose…</option>
              {fixtures.map((f) => (
                <option key={f.id} value={f.id}>
                  {unitName(f)}
                </option>
              ))}
            </select>
            {draft.errors.fixtureId ? (
              <span role="alert" className="text-danger">
                {draft.errors.fixtureId}
              </span>
            ) : null}
          </label>
          {ACCESSORY_FIELDS.map((fd) =>
            field(
              fd.key,
              draft.text,
              draft.errors,
              (text) => setDraft({ ...draft, text }),
              `${fd.label} of the new accessory`,
            ),
          )}
          <Button onClick={() => void add()} disabled={m.create.isPending}>
            Add accessory
          </Button>
          {draft.errors.form ? (
            <p role="alert" className="w-full text-xs text-danger">
              {draft.errors.form}
            </p>
          ) : null}
        </div>
      ) : null}
      {status ? (
        <p role="status" className="mt-2 text-sm">
          {status}
        </p>
      ) : null}
    </section>
  );
}
