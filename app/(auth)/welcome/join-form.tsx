"use client";

import { useActionState } from "react";
import { joinInvitationAction } from "../actions";
import { IDLE } from "@/lib/http/action-state";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

export function JoinForm({ invitationId, productionName }: { invitationId: number; productionName: string }) {
  const [state, action, pending] = useActionState(joinInvitationAction, IDLE);
  return (
    <form action={action} className="flex flex-col items-end gap-1">
      <input type="hidden" name="invitationId" value={invitationId} />
      <Button type="submit" disabled={pending} aria-label={`Join ${productionName}`} className="min-h-9 px-3">
        {pending ? "Joining…" : "Join"}
      </Button>
      <FormMessage message={state.status === "error" ? state.message : undefined} />
    </form>
  );
}
