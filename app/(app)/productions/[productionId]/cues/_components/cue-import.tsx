"use client";

import { useState } from "react";
import { useImportCues } from "@/hooks/use-cues";
import { ApiError } from "@/lib/http/api-client";
import { Button } from "@/components/ui/button";

/** Reads a USITT ASCII file and replaces the cue list, showing every line the server complained about. */
export function CueImport({ productionId }: { productionId: number }) {
  const mutation = useImportCues(productionId);
  const [file, setFile] = useState<File | null>(null);
  const [mode, setMode] = useState<"state" | "moves">("state");
  const [result, setResult] = useState<{ tone: "ok" | "error"; text: string; lines: string[] } | null>(null);

  async function run(e: React.FormEvent) {
    e.preventDefault();
    if (!file) return setResult({ tone: "error", text: "Choose a file first.", lines: [] });
    if (!window.confirm("Importing replaces every cue of this production. Go on?")) return;
    try {
      const out = await mutation.mutateAsync({ text: await file.text(), mode });
      setResult({
        tone: "ok",
        text: `${out.imported} cues imported.`,
        lines: out.notices.map((n) => (n.line ? `line ${n.line}: ${n.message}` : n.message)),
      });
    } catch (err) {
      const lines =
        err instanceof ApiError ? Object.entries(err.fieldErrors).map(([k, v]) => `${k}: ${v.join("; ")}`) : [];
      setResult({ tone: "error", text: (err as Error).message, lines });
    }
  }

  return (
    <form onSubmit={run} className="flex flex-col gap-2 border-t border-line pt-3">
      <span className="font-medium">Import a USITT ASCII file (replaces the cue list)</span>
      <div className="flex flex-wrap items-center gap-2">
        <input
          type="file"
          accept=".asc,.txt,text/plain"
          aria-label="USITT ASCII file"
          onChange={(e) => setFile(e.target.files?.[0] ?? null)}
          className="text-sm"
        />
        <select
          value={mode}
          onChange={(e) => setMode(e.target.value as "state" | "moves")}
          aria-label="How to read each cue"
          className="min-h-10 rounded-md border border-line bg-surface px-2"
        >
          <option value="state">each cue is a full look (unlisted channels are out)</option>
          <option value="moves">each cue lists changes only (unlisted channels keep their level)</option>
        </select>
        <Button type="submit" variant="secondary" disabled={mutation.isPending}>
          {mutation.isPending ? "Importing…" : "Import"}
        </Button>
      </div>
      {result ? (
        <div
          role={result.tone === "error" ? "alert" : "status"}
          className={`text-sm ${result.tone === "error" ? "text-danger" : "text-success"}`}
        >
          <p>{result.text}</p>
          {result.lines.length ? (
            <ul className="mt-1 max-h-32 list-disc overflow-auto pl-5 text-xs text-muted">
              {result.lines.map((l) => (
                <li key={l}>{l}</li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
    </form>
  );
}
