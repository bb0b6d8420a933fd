"use client";

import { useActionState } from "react";
import { signUpAction } from "../actions";
import { fieldError, IDLE, typedValue } from "@/lib/http/action-state";
import { TextField } from "@/components/ui/text-field";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

export function SignUpForm() {
  const [state, action, pending] = useActionState(signUpAction, IDLE);
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
        autoComplete="username"
        required
        defaultValue={typedValue(state, "email")}
        error={fieldError(state, "email")}
      />
      <TextField
        label="Password"
        name="password"
        type="password"
        autoComplete="new-password"
        required
        hint="At least 10 characters."
        error={fieldError(state, "password")}
      />
      <FormMessage message={state.status === "error" ? state.message : undefined} />
      <Button type="submit" disabled={pending}>
        {pending ? "Creating…" : "Create account"}
      </Button>
    </form>
  );
}
