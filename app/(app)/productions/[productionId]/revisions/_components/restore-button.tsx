"use client";
// Puts one fixture's or cue's values back as a revision had them: a new, recorded change, sent with the
// version this page showed, so a change made meanwhile by someone else is not overwritten (409).
import { useRouter } from "next/navigation";
import { useState } from "react";
import { ApiError, apiFetch } from "@/lib/http/api-client";

export function RestoreButton(props: {
  productionId: number;
  revisionId: number;
  revisionLabel: string;
  entity: "fixture" | "cue";
  id: number;
  version: number;
  name: string;
}) {
  const router = useRouter();
  const [state, setState] = useState<{ busy: boolean; message: string | null }>({ busy: false, message: null });
  async function restore() {
    if (!window.confirm(`Put ${props.name} back as it was in revision ${props.revisionLabel}?`)) return;
    setState({ busy: true, message: null });
    try {
      await apiFetch(`/api/productions/${props.productionId}/revisions/${props.revisionId}/restore`, {
        method: "POST",
        json: { entity: props.entity, id: props.id, version: props.version },
      });
      setState({ busy: false, message: "Restored." });
      router.refresh();
    } catch (err) {
      const message =
        err instanceof ApiError
          ? err.status === 409
            ? "Someone changed it after this page was opened: reload to see their change first."
            : err.message
          : "Not restored: check the connection.";
      setState({ busy: false, message });
    }
  }
  return (
    <span className="inline-flex items-center gap-2 print:hidden">
      <button
        type="button"
        onClick={restore}
        disabled={state.busy}
        className="rounded border border-line px-2 py-0.5 text-xs hover:bg-raised disabled:opacity-50"
        aria-label={`Restore ${props.name} from revision ${props.revisionLabel}`}
      >
        {state.busy ? "Restoring…" : `Restore ${props.revisionLabel}`}
      </button>
      <span role="status" aria-live="polite" className="text-xs text-muted">
        {state.message}
      </span>
    </span>
  );
}
