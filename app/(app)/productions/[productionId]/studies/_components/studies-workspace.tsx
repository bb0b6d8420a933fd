"use client";

import { useState } from "react";
import type { StudiesProps } from "./types";
import { CoverageStudy } from "./coverage-study";
import { ShadowStudy } from "./shadow-study";

/** The two studies side by side as tabs; the choice is kept in the URL so a link opens the same one. */
export function StudiesWorkspace(props: StudiesProps) {
  const [study, setStudy] = useState(props.initialStudy);
  const choose = (s: "coverage" | "shadows") => {
    setStudy(s);
    const url = new URL(window.location.href);
    url.searchParams.set("study", s);
    window.history.replaceState(null, "", url);
  };
  return (
    <div className="flex flex-col gap-3">
      <div role="tablist" aria-label="Study" className="flex gap-2">
        {(["coverage", "shadows"] as const).map((s) => (
          <button
            type="button"
            key={s}
            role="tab"
            aria-selected={study === s}
            onClick={() => choose(s)}
            className={`rounded-md px-3 py-1.5 text-sm ${study === s ? "bg-accent text-accent-ink" : "border border-line bg-surface text-ink"}`}
          >
            {s === "coverage" ? "Coverage" : "Shadows"}
          </button>
        ))}
      </div>
      {study === "coverage" ? <CoverageStudy {...props} /> : <ShadowStudy {...props} />}
    </div>
  );
}
