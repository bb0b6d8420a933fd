"use client";

import { useActionState } from "react";
import { finishSignUpAction } from "../../actions";
import { fieldError, IDLE, typedValue } from "@/lib/http/action-state";
import { TextField } from "@/components/ui/text-field";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

export function FinishSignUpForm({ token, name }: { token: string; name: string }) {
  const [state, action, pending] = useActionState(finishSignUpAction, IDLE);
  return (
    <form action={action} className="flex flex-col gap-3" noValidate>
      <input type="hidden" name="token" value={token} />
      <TextField
        label="Your name"
        name="name"
        autoComplete="name"
        required
        defaultValue={typedValue(state, "name") ?? name}
        error={fieldError(state, "name")}
      />
      <TextField
        label="Choose a password"
        name="password"
        type="password"
        autoComplete="new-password"
        required
        hint="At least 10 characters."
        error={fieldError(state, "password")}
      />
      <FormMessage message={state.status === "error" ? state.message : undefined} />
      <Button type="submit" disabled={pending}>
        {pending ? "Creating…" : "Create my account"}
      </Button>
    </form>
  );
}
