"use client";
// A member's own choice whether the revision e-mail reaches them (nobody else's).
import { useState } from "react";
import { apiFetch } from "@/lib/http/api-client";

export function RevisionMailToggle({ productionId, initial }: { productionId: number; initial: boolean }) {
  const [on, setOn] = useState(initial);
  const [state, setState] = useState<{ busy: boolean; message: string | null }>({ busy: false, message: null });
  async function change(next: boolean) {
    setState({ busy: true, message: null });
    try {
      const r = await apiFetch<{ receive: boolean }>(`/api/productions/${productionId}/revisions/mail-choice`, {
        method: "PUT",
        json: { receive: next },
      });
      setOn(r.receive);
      setState({ busy: false, message: r.receive ? "You will get the revision e-mail." : "No more revision e-mail." });
    } catch (err) {
      setState({ busy: false, message: err instanceof Error ? err.message : "Not saved." });
    }
  }
  return (
    <div className="flex flex-wrap items-center gap-3 text-sm">
      <label className="flex min-h-10 items-center gap-2">
        <input
          type="checkbox"
          checked={on}
          disabled={state.busy}
          onChange={(e) => void change(e.target.checked)}
          className="h-5 w-5"
        />
        E-mail me the summary of changes when a revision is issued
      </label>
      <span role="status" aria-live="polite" className="text-xs text-muted">
        {state.message}
      </span>
    </div>
  );
}
