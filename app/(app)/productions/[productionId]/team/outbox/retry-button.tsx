"use client";

import { useActionState } from "react";
import { retryMailAction } from "./actions";
import { IDLE } from "@/lib/http/action-state";
import { Button } from "@/components/ui/button";

export function RetryButton({ productionId }: { productionId: number }) {
  const [state, action, pending] = useActionState(retryMailAction.bind(null, productionId), IDLE);
  return (
    <form action={action} className="flex items-center gap-2">
      <Button type="submit" variant="secondary" disabled={pending} className="min-h-9 px-3">
        {pending ? "Trying…" : "Try queued mail now"}
      </Button>
      {state.status !== "idle" ? (
        <span role="status" className="text-xs text-muted">
          {state.message}
        </span>
      ) : null}
    </form>
  );
}
