"use client";

import { useActionState } from "react";
import { signInAction } from "../actions";
import { fieldError, IDLE, typedValue } from "@/lib/http/action-state";
import { TextField } from "@/components/ui/text-field";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

export function SignInForm() {
  const [state, action, pending] = useActionState(signInAction, IDLE);
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
      <TextField
        label="Password"
        name="password"
        type="password"
        autoComplete="current-password"
        required
        error={fieldError(state, "password")}
      />
      <FormMessage message={state.status === "error" ? state.message : undefined} />
      <Button type="submit" disabled={pending}>
        {pending ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
