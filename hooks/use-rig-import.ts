"use client";

import { useState } from "react";
import { useQueryClient } from "@tanstack/react-query";
import { ApiError } from "@/lib/http/api-client";
import type { ImportPreview } from "@/lib/dto/import";
import type { ColumnTarget } from "@/lib/io/fields";
import { productionKeys } from "./query-keys";

export type ImportOptions = {
  mapping?: ColumnTarget[];
  lengthUnit?: "m" | "ft";
  createMissing: boolean;
  sheet?: string;
};
export type ImportProgress = { stage: string; done: number; total: number } | null;

function body(file: File, mode: "preview" | "commit", options: ImportOptions) {
  const form = new FormData();
  form.set("file", file);
  form.set("options", JSON.stringify({ mode, ...options }));
  return form;
}

async function failure(res: Response): Promise<never> {
  const json = await res.json().catch(() => null);
  const e = json?.error ?? {};
  throw new ApiError(res.status, e.code ?? "internal", e.message ?? `Import failed (${res.status})`, e.fieldErrors);
}

/** Preview and commit of a rig file; the commit streams progress lines so thousands of rows show a moving bar. */
export function useRigImport(productionId: number) {
  const qc = useQueryClient();
  const [progress, setProgress] = useState<ImportProgress>(null);
  const url = `/api/productions/${productionId}/import`;

  // Both steps stream newline-delimited JSON: progress lines while the server reads, checks (and writes),
  // then one line with the answer, so a file of thousands of rows shows a moving bar from the start.
  async function streamed<T>(
    file: File,
    mode: "preview" | "commit",
    options: ImportOptions,
    answer: "preview" | "result",
  ): Promise<T> {
    setProgress({ stage: "uploading", done: 0, total: 1 });
    try {
      const res = await fetch(`${url}?stream=1`, { method: "POST", body: body(file, mode, options) });
      if (!res.ok || !res.body) return await failure(res);
      const reader = res.body.pipeThrough(new TextDecoderStream()).getReader();
      let buffer = "";
      for (;;) {
        const { value, done } = await reader.read();
        buffer += value ?? "";
        const lines = buffer.split("\n");
        buffer = lines.pop() ?? "";
        for (const line of lines.filter(Boolean)) {
          const msg = JSON.parse(line);
          if (msg.progress) setProgress(msg.progress);
          if (msg.error)
            throw new ApiError(msg.status ?? 400, msg.error.code, msg.error.message, msg.error.fieldErrors);
          if (msg[answer]) return msg[answer] as T;
        }
        if (done)
          throw new ApiError(
            500,
            "internal",
            mode === "commit"
              ? "The import stopped without an answer. Check the rig before trying again."
              : "The check stopped without an answer. Try again.",
          );
      }
    } finally {
      setProgress(null);
    }
  }

  const preview = (file: File, options: ImportOptions) => streamed<ImportPreview>(file, "preview", options, "preview");

  async function commit(file: File, options: ImportOptions): Promise<ImportPreview> {
    try {
      return await streamed<ImportPreview>(file, "commit", options, "result");
    } finally {
      await qc.invalidateQueries({ queryKey: productionKeys.fixtures(productionId) });
      await qc.invalidateQueries({ queryKey: productionKeys.fixtureTypes(productionId) });
    }
  }

  return { preview, commit, progress };
}
