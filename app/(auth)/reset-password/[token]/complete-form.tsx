"use client";

import { useActionState } from "react";
import { completeResetAction } from "../actions";
import { fieldError, IDLE } from "@/lib/http/action-state";
import { TextField } from "@/components/ui/text-field";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

export function CompleteResetForm({ token }: { token: string }) {
  const [state, action, pending] = useActionState(completeResetAction, IDLE);
  return (
    <form action={action} className="flex flex-col gap-3" noValidate>
      <input type="hidden" name="token" value={token} />
      <TextField
        label="New password"
        name="password"
        type="password"
        autoComplete="new-password"
        required
        hint="At least 10 characters."
        error={fieldError(state, "password")}
      />
      <FormMessage message={state.status === "error" ? state.message : undefined} />
      <Button type="submit" disabled={pending}>
        {pending ? "Saving…" : "Save and sign in"}
      </Button>
    </form>
  );
}
