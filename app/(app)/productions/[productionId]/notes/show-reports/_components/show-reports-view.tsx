"use client";

import { useState } from "react";
import Link from "next/link";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { ApiError, apiFetch } from "@/lib/http/api-client";
import type { ShowReportDto } from "@/lib/notes/dto";
import type { NoteSubjects } from "@/lib/notes/subjects";
import { KIND_LABELS } from "@/lib/notes/words";
import { NOTE_KINDS, type NoteKind } from "@/models/note-vocabulary";
import { notesKey } from "../../_components/use-notes";

type Item = { body: string; kind: NoteKind; fixtureId: string };
type Fault = { fixtureId: string; kind: "lamp_out" | "fault"; description: string };
const input = "rounded border border-line bg-raised px-2 py-1";
const today = () => new Date().toISOString().slice(0, 10);

/** The stage manager's report after a performance; lighting items become notes for the people who do them. */
export function ShowReportsView({
  productionId,
  initial,
  subjects,
  canFile,
}: {
  productionId: number;
  initial: ShowReportDto[];
  subjects: NoteSubjects;
  canFile: boolean;
}) {
  const qc = useQueryClient();
  const key = [...notesKey(productionId), "show-reports"];
  const { data: reports } = useQuery({
    queryKey: key,
    queryFn: async () =>
      (await apiFetch<{ showReports: ShowReportDto[] }>(`/api/productions/${productionId}/notes/show-reports`))
        .showReports,
    initialData: initial,
  });
  const [performance, setPerformance] = useState("");
  const [performedOn, setPerformedOn] = useState(today());
  const [summary, setSummary] = useState("");
  const [items, setItems] = useState<Item[]>([]);
  const [faults, setFaults] = useState<Fault[]>([]);
  const [errors, setErrors] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<string | null>(null);
  const file = useMutation({
    mutationFn: () =>
      apiFetch<{ report: ShowReportDto }>(`/api/productions/${productionId}/notes/show-reports`, {
        method: "POST",
        json: {
          performance,
          performedOn,
          summary,
          items: items.map((i) =>
            i.fixtureId
              ? { body: i.body, kind: i.kind, subject: "fixture", subjectId: Number(i.fixtureId) }
              : { body: i.body, kind: i.kind, subject: "production" },
          ),
          faults: faults.map((f) => ({
            fixtureId: f.fixtureId ? Number(f.fixtureId) : null,
            kind: f.kind,
            description: f.description,
          })),
        },
      }),
    onSettled: () => qc.invalidateQueries({ queryKey: notesKey(productionId) }),
  });
  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    setErrors({});
    setMessage(null);
    try {
      const r = await file.mutateAsync();
      setMessage(`Report filed: ${r.report.noteIds.length} note${r.report.noteIds.length === 1 ? "" : "s"} written.`);
      setPerformance("");
      setSummary("");
      setItems([]);
      setFaults([]);
    } catch (err) {
      if (err instanceof ApiError) setErrors(err.fieldErrors);
      setMessage((err as Error).message);
    }
  };
  const unitSelect = (value: string, onChange: (v: string) => void, label: string) => (
    <label className="flex flex-col gap-1">
      {label}
      <select className={input} value={value} onChange={(e) => onChange(e.target.value)}>
        <option value="">not one unit</option>
        {subjects.fixture.map((f) => (
          <option key={f.id} value={f.id}>
            {f.label}
          </option>
        ))}
      </select>
    </label>
  );
  const errorList = Object.entries(errors);
  const fixtureLabel = (id: number | null) =>
    id == null ? "" : (subjects.fixture.find((f) => f.id === id)?.label ?? `#${id}`);

  return (
    <main className="mx-auto flex max-w-5xl flex-col gap-4 p-4">
      <Link href={`/productions/${productionId}/notes`} className="text-sm underline">
        All notes
      </Link>
      <h2 className="text-base font-semibold">Show reports</h2>
      {canFile ? (
        <form
          onSubmit={submit}
          aria-label="New show report"
          className="flex flex-col gap-3 rounded-md border border-line bg-surface p-3 text-sm"
        >
          <div className="flex flex-wrap gap-3">
            <label className="flex flex-col gap-1">
              Performance
              <input
                className={input}
                value={performance}
                maxLength={80}
                placeholder="Evening 3"
                onChange={(e) => setPerformance(e.target.value)}
                required
              />
            </label>
            <label className="flex flex-col gap-1">
              Date
              <input
                type="date"
                className={input}
                value={performedOn}
                onChange={(e) => setPerformedOn(e.target.value)}
                required
              />
            </label>
          </div>
          <label className="flex flex-col gap-1">
            How it went
            <textarea
              className={input}
              rows={3}
              maxLength={4000}
              value={summary}
              onChange={(e) => setSummary(e.target.value)}
            />
          </label>
          <fieldset className="flex flex-col gap-2">
            <legend className="font-medium">
              Lighting items (each becomes a note for whoever does that kind of job)
            </legend>
            {items.map((it, i) => (
              <div key={i} className="flex flex-wrap items-end gap-2">
                <label className="flex flex-1 flex-col gap-1">
                  Item {i + 1}
                  <input
                    className={input}
                    value={it.body}
                    onChange={(e) => setItems(items.map((x, j) => (j === i ? { ...x, body: e.target.value } : x)))}
                  />
                </label>
                <label className="flex flex-col gap-1">
                  Kind
                  <select
                    className={input}
                    value={it.kind}
                    onChange={(e) =>
                      setItems(items.map((x, j) => (j === i ? { ...x, kind: e.target.value as NoteKind } : x)))
                    }
                  >
                    {NOTE_KINDS.map((k) => (
                      <option key={k} value={k}>
                        {KIND_LABELS[k]}
                      </option>
                    ))}
                  </select>
                </label>
                {unitSelect(
                  it.fixtureId,
                  (v) => setItems(items.map((x, j) => (j === i ? { ...x, fixtureId: v } : x))),
                  "Unit",
                )}
                <Button type="button" variant="quiet" onClick={() => setItems(items.filter((_, j) => j !== i))}>
                  Remove
                </Button>
              </div>
            ))}
            <Button
              type="button"
              variant="secondary"
              onClick={() => setItems([...items, { body: "", kind: "work", fixtureId: "" }])}
            >
              Add a lighting item
            </Button>
          </fieldset>
          <fieldset className="flex flex-col gap-2">
            <legend className="font-medium">Lamp-out and fault log (a logged unit gets a work note)</legend>
            {faults.map((f, i) => (
              <div key={i} className="flex flex-wrap items-end gap-2">
                {unitSelect(
                  f.fixtureId,
                  (v) => setFaults(faults.map((x, j) => (j === i ? { ...x, fixtureId: v } : x))),
                  `Entry ${i + 1}: unit`,
                )}
                <label className="flex flex-col gap-1">
                  What
                  <select
                    className={input}
                    value={f.kind}
                    onChange={(e) =>
                      setFaults(faults.map((x, j) => (j === i ? { ...x, kind: e.target.value as Fault["kind"] } : x)))
                    }
                  >
                    <option value="lamp_out">Lamp out</option>
                    <option value="fault">Fault</option>
                  </select>
                </label>
                <label className="flex flex-1 flex-col gap-1">
                  Seen
                  <input
                    className={input}
                    value={f.description}
                    maxLength={300}
                    onChange={(e) =>
                      setFaults(faults.map((x, j) => (j === i ? { ...x, description: e.target.value } : x)))
                    }
                  />
                </label>
                <Button type="button" variant="quiet" onClick={() => setFaults(faults.filter((_, j) => j !== i))}>
                  Remove
                </Button>
              </div>
            ))}
            <Button
              type="button"
              variant="secondary"
              onClick={() => setFaults([...faults, { fixtureId: "", kind: "lamp_out", description: "" }])}
            >
              Log a lamp out or fault
            </Button>
          </fieldset>
          <div className="flex items-center gap-3">
            <Button type="submit" disabled={file.isPending}>
              File the report
            </Button>
            {message ? <span role="status">{message}</span> : null}
          </div>
          {errorList.length ? (
            <ul role="alert" className="text-danger">
              {errorList.map(([k, v]) => (
                <li key={k}>
                  {k}: {v.join("; ")}
                </li>
              ))}
            </ul>
          ) : null}
        </form>
      ) : null}
      <section aria-label="Filed reports" className="flex flex-col gap-3">
        {reports.length === 0 ? <p className="text-sm text-muted">No show reports yet.</p> : null}
        {reports.map((r) => (
          <article key={r.id} className="rounded-md border border-line bg-surface p-3 text-sm">
            <h3 className="font-medium">
              {r.performance} · {r.performedOn}
            </h3>
            {r.summary ? <p className="whitespace-pre-wrap">{r.summary}</p> : null}
            {r.faults.length ? (
              <ul className="mt-1">
                {r.faults.map((f) => (
                  <li key={f.id}>
                    {f.kind === "lamp_out" ? "Lamp out" : "Fault"}
                    {f.fixtureId != null ? ` · ${fixtureLabel(f.fixtureId)}` : ""}: {f.description}
                  </li>
                ))}
              </ul>
            ) : (
              <p className="text-muted">No lamps out or faults logged.</p>
            )}
            <p className="mt-1 text-xs text-muted">
              {r.noteIds.length} note{r.noteIds.length === 1 ? "" : "s"} written from this report.
            </p>
          </article>
        ))}
      </section>
    </main>
  );
}
