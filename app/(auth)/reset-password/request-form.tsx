"use client";

import { useActionState } from "react";
import { requestResetAction } from "./actions";
import { fieldError, IDLE, typedValue } from "@/lib/http/action-state";
import { TextField } from "@/components/ui/text-field";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

export function RequestResetForm() {
  const [state, action, pending] = useActionState(requestResetAction, IDLE);
  if (state.status === "ok")
    return (
      <p role="status" className="text-sm">
        {state.message}
      </p>
    );
  return (
    <form action={action} className="flex flex-col gap-3" noValidate>
      <TextField
        label="E-mail"
        name="email"
        type="email"
        autoComplete="username"
        required
        defaultValue={typedValue(state, "email")}
        error={fieldError(state, "email")}
      />
      <FormMessage message={state.status === "error" ? state.message : undefined} />
      <Button type="submit" disabled={pending}>
        {pending ? "Sending…" : "Send me a link"}
      </Button>
    </form>
  );
}
