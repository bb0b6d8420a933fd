"use client";

import { useState } from "react";
import Link from "next/link";
import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { Button } from "@/components/ui/button";
import { ApiError, apiFetch } from "@/lib/http/api-client";
import type { ShowReportDto } from "@/lib/notes/dto";
import type { NoteSubjects } from "@/lib/notes/subjects";
import { notesKey } from "../../_components/use-notes";
import { itemForServer, itemFromServer, type Item } from "./report-items";
import { ReportCard } from "./report-card";
import { FaultsFieldset, ItemsFieldset, type Fault } from "./report-form-lists";

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
  /** The draft being edited (its id and the version read), or null for a new report. */
  const [editing, setEditing] = useState<{ id: number; version: number } | null>(null);
  const api = `/api/productions/${productionId}/notes/show-reports`;
  const refresh = () => qc.invalidateQueries({ queryKey: notesKey(productionId) });
  const body = () => ({
    performance,
    performedOn,
    summary,
    items: items.map(itemForServer),
    faults: faults.map((f) => ({
      fixtureId: f.fixtureId ? Number(f.fixtureId) : null,
      kind: f.kind,
      description: f.description,
    })),
  });
  const save = useMutation({
    mutationFn: (send: boolean) =>
      editing
        ? apiFetch<{ showReport: ShowReportDto }>(`${api}/${editing.id}`, {
            method: "PATCH",
            json: { version: editing.version, ...body() },
          }).then((r) => ({ report: r.showReport }))
        : apiFetch<{ report: ShowReportDto }>(api, { method: "POST", json: { ...body(), send } }),
    onSettled: refresh,
  });
  const send = useMutation({
    mutationFn: (r: { id: number; version: number }) =>
      apiFetch<{ report: ShowReportDto }>(`${api}/${r.id}/send`, { method: "POST", json: { version: r.version } }),
    onSettled: refresh,
  });
  const clear = () => {
    setEditing(null);
    setPerformance("");
    setPerformedOn(today());
    setSummary("");
    setItems([]);
    setFaults([]);
  };
  const load = (r: ShowReportDto) => {
    setErrors({});
    setMessage(`Editing the draft for ${r.performance}.`);
    setEditing({ id: r.id, version: r.version });
    setPerformance(r.performance);
    setPerformedOn(r.performedOn);
    setSummary(r.summary);
    setItems(r.items.map(itemFromServer));
    setFaults(
      r.faults.map((f) => ({
        fixtureId: f.fixtureId == null ? "" : String(f.fixtureId),
        kind: f.kind,
        description: f.description,
      })),
    );
  };
  const failed = (err: unknown) => {
    if (err instanceof ApiError) setErrors(err.fieldErrors);
    if (err instanceof ApiError && err.status === 409) {
      const current = err.current as ShowReportDto | undefined;
      if (current?.status === "draft") {
        load(current);
        setMessage(`${err.message} The form now shows it; make your change again.`);
        return;
      }
      clear();
    }
    setMessage((err as Error).message);
  };
  const submit = async (e: React.FormEvent, sendNow: boolean) => {
    e.preventDefault();
    setErrors({});
    setMessage(null);
    try {
      let r = (await save.mutateAsync(sendNow)).report;
      // Kept at once, so a failed send below leaves the form holding the saved draft's version.
      if (r.status === "draft") setEditing({ id: r.id, version: r.version });
      // An edited draft is saved first, then sent at the version the save left it at.
      if (sendNow && r.status === "draft") r = (await send.mutateAsync(r)).report;
      setMessage(
        r.status === "sent"
          ? `Report sent to the team: ${r.noteIds.length} note${r.noteIds.length === 1 ? "" : "s"} written.`
          : `Draft saved for ${r.performance}. It goes to nobody until you send it.`,
      );
      if (r.status === "sent") clear();
    } catch (err) {
      failed(err);
    }
  };
  const sendDraft = async (r: ShowReportDto) => {
    setErrors({});
    setMessage(null);
    try {
      const sent = (await send.mutateAsync(r)).report;
      if (editing?.id === r.id) clear();
      setMessage(
        `Report sent to the team: ${sent.noteIds.length} note${sent.noteIds.length === 1 ? "" : "s"} written.`,
      );
    } catch (err) {
      failed(err);
    }
  };
  const busy = save.isPending || send.isPending;
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
          onSubmit={(e) => submit(e, (e.nativeEvent as SubmitEvent).submitter?.dataset.send === "yes")}
          aria-label={editing ? "Edit the draft show report" : "New show report"}
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
          <ItemsFieldset items={items} setItems={setItems} unitSelect={unitSelect} />
          <FaultsFieldset faults={faults} setFaults={setFaults} unitSelect={unitSelect} />
          <div className="flex flex-wrap items-center gap-3">
            {/* The draft button comes first: Enter in a field saves a draft and never sends the report. */}
            <Button type="submit" variant="secondary" disabled={busy}>
              {editing ? "Save the draft" : "Save as a draft"}
            </Button>
            <Button type="submit" data-send="yes" disabled={busy}>
              {editing ? "Save and send to the team" : "File and send to the team"}
            </Button>
            {editing ? (
              <Button type="button" variant="quiet" onClick={clear}>
                Stop editing (keeps the saved draft)
              </Button>
            ) : null}
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
      <section aria-label="Reports" className="flex flex-col gap-3">
        {reports.length === 0 ? <p className="text-sm text-muted">No show reports yet.</p> : null}
        {reports.map((r) => (
          <ReportCard
            key={r.id}
            report={r}
            fixtureLabel={fixtureLabel}
            actions={
              r.status === "draft" && canFile ? (
                <span className="ml-auto flex gap-2">
                  <Button type="button" variant="secondary" disabled={busy} onClick={() => load(r)}>
                    Edit {r.performance}
                  </Button>
                  <Button type="button" disabled={busy} onClick={() => sendDraft(r)}>
                    Send {r.performance}
                  </Button>
                </span>
              ) : null
            }
          />
        ))}
      </section>
    </main>
  );
}
