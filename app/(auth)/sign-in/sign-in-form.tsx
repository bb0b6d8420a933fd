"use client";

import { useActionState } from "react";
import { signInAction, type AuthFormState } from "../actions";
import { TextField } from "@/components/ui/text-field";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

export function SignInForm() {
  const [state, action, pending] = useActionState<AuthFormState, FormData>(signInAction, {});
  return (
    <form action={action} className="flex flex-col gap-3" noValidate>
      <TextField label="E-mail" name="email" type="email" autoComplete="username" required defaultValue={state.values?.email} error={state.fieldErrors?.email} />
      <TextField label="Password" name="password" type="password" autoComplete="current-password" required error={state.fieldErrors?.password} />
      <FormMessage message={state.message} />
      <Button type="submit" disabled={pending}>
        {pending ? "Signing in…" : "Sign in"}
      </Button>
    </form>
  );
}
