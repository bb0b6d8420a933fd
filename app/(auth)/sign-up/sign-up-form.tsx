"use client";

import { useActionState } from "react";
import { signUpAction } from "../actions";
import { fieldError, IDLE, typedValue } from "@/lib/http/action-state";
import { TextField } from "@/components/ui/text-field";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

export function SignUpForm() {
  const [state, action, pending] = useActionState(signUpAction, IDLE);
  if (state.status === "ok")
    return (
      <p role="status" className="text-sm">
        {state.message}
      </p>
    );
  return (
    <form action={action} className="flex flex-col gap-3" noValidate>
      <TextField
        label="Your name"
        name="name"
        autoComplete="name"
        required
        defaultValue={typedValue(state, "name")}
        error={fieldError(state, "name")}
      />
      <TextField
        label="E-mail"
        name="email"
        type="email"
        autoComplete="email"
        required
        hint="We send a link there; you choose your password from it."
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
