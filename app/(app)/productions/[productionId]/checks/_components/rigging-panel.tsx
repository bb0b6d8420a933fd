"use client";
// Weight on each hanging position against its rated load, lift-line shares, and counterweight.
import { useState } from "react";
import type { RiggingResult } from "@/lib/checks/rigging";
import type { ChecksReport } from "@/lib/dto/checks";
import { ApiError } from "@/lib/http/api-client";
import { sendLiftLines, useChecksWrite } from "./use-checks";

const STATUS = {
  ok: ["", "under 80 %"],
  near: ["text-caution", "80 % or more"],
  over: ["font-semibold text-danger", "over the rating"],
  "no-rating": ["text-muted", "no rated load entered"],
} as const;
const kg = (n: number | null) => (n == null ? "–" : n.toLocaleString(undefined, { maximumFractionDigits: 1 }));

export function RiggingPanel({
  productionId,
  rigging,
  liftLines,
  canEdit,
}: {
  productionId: number;
  rigging: RiggingResult;
  liftLines: ChecksReport["liftLines"];
  canEdit: boolean;
}) {
  const lines = new Map(liftLines.map((l) => [l.positionId, l]));
  const write = useChecksWrite(productionId, sendLiftLines);
  const err = write.error instanceof ApiError ? write.error.message : null;
  return (
    <div className="flex flex-col gap-3">
      <div className="overflow-x-auto">
        <table className="w-full text-sm" data-testid="rigging-table">
          <thead className="text-left text-xs text-muted">
            <tr>
              <th className="py-1">Position</th>
              <th>Units</th>
              <th title="fixtures + accessories + cable + hardware">Total kg</th>
              <th>Rated kg</th>
              <th>%</th>
              <th>Status</th>
              <th title="The uniform load that would bend the pipe as much as its units do">As if spread</th>
              <th>Lift lines</th>
              <th>Per line kg</th>
              <th>Arbor</th>
            </tr>
          </thead>
          <tbody>
            {rigging.positions.map((p) => {
              const [tone, words] = STATUS[p.status];
              const ll = lines.get(p.id);
              return (
                <tr key={p.id} className="border-t border-line" data-position={p.name} data-status={p.status}>
                  <td className="py-1 font-medium">{p.name}</td>
                  <td className="tabular-nums">{p.units}</td>
                  <td
                    className="tabular-nums"
                    title={`fixtures ${kg(p.fixturesKg)}, accessories ${kg(p.accessoriesKg)}, cable ${kg(p.cableKg)}, hardware ${kg(p.hardwareKg)}`}
                  >
                    {kg(p.totalKg)}
                    {p.notCounted.length ? " +?" : ""}
                  </td>
                  <td className="tabular-nums">{kg(p.ratedLoadKg)}</td>
                  <td className="tabular-nums">{p.fraction == null ? "–" : Math.round(p.fraction * 100)}</td>
                  <td className={tone}>{words}</td>
                  <td className="tabular-nums">{kg(p.bendingEquivalentKg)}</td>
                  <td>
                    {ll ? (
                      canEdit ? (
                        <LiftLinesInput
                          name={p.name}
                          value={ll.liftLines}
                          disabled={write.isPending}
                          onSave={(n) => write.mutate({ positionId: p.id, liftLines: n, version: ll.version })}
                        />
                      ) : (
                        (ll.liftLines ?? "–")
                      )
                    ) : (
                      "–"
                    )}
                  </td>
                  <td className="tabular-nums">{p.liftLineKg ? p.liftLineKg.map((x) => kg(x)).join(" / ") : "–"}</td>
                  <td className="tabular-nums">{p.arborAddKg != null ? `add ${kg(p.arborAddKg)} kg` : "–"}</td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      {err ? (
        <p className="text-sm text-danger" aria-live="polite">
          {err}
        </p>
      ) : null}
      {rigging.notCounted.length ? (
        <p className="text-sm text-caution">
          Not counted (no weight): {rigging.notCounted.map((u) => u.label).join(", ")}. "+?" marks an incomplete total.
        </p>
      ) : null}
      <ul className="list-disc pl-5 text-xs text-muted">
        <li>
          Lift-line shares assume equally spaced lines with one at each end of the pipe and the load spread along it (a
          continuous beam: with three lines the middle carries 62.5 %).
        </li>
        <li>
          "As if spread": units are point loads; a unit at mid-span bends a pipe as much as twice its weight spread
          evenly. Compare it with a distributed-load rating.
        </li>
        <li>
          On a counterweight set, add the weight shown to the arbor as the pipe is loaded. Never release an
          out-of-weight set; follow the venue's loading procedure.
        </li>
      </ul>
    </div>
  );
}

function LiftLinesInput({
  name,
  value,
  disabled,
  onSave,
}: {
  name: string;
  value: number | null;
  disabled: boolean;
  onSave: (n: number | null) => void;
}) {
  const [text, setText] = useState(value == null ? "" : String(value));
  return (
    <input
      aria-label={`Lift lines of ${name}`}
      className="w-14 rounded border border-line bg-surface px-1 tabular-nums"
      inputMode="numeric"
      value={text}
      disabled={disabled}
      onChange={(e) => setText(e.target.value)}
      onBlur={() => {
        const n = text.trim() ? Number(text) : null;
        if (n !== value) onSave(n);
      }}
      onKeyDown={(e) => {
        if (e.key === "Enter") (e.target as HTMLInputElement).blur();
      }}
    />
  );
}
