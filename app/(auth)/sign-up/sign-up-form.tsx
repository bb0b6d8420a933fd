"use client";

import { useActionState } from "react";
import { signUpAction, type AuthFormState } from "../actions";
import { TextField } from "@/components/ui/text-field";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

export function SignUpForm() {
  const [state, action, pending] = useActionState<AuthFormState, FormData>(signUpAction, {});
  return (
    <form action={action} className="flex flex-col gap-3" noValidate>
      <TextField label="Your name" name="name" autoComplete="name" required defaultValue={state.values?.name} error={state.fieldErrors?.name} />
      <TextField label="E-mail" name="email" type="email" autoComplete="username" required defaultValue={state.values?.email} error={state.fieldErrors?.email} />
      <TextField label="Password" name="password" type="password" autoComplete="new-password" required hint="At least 10 characters." error={state.fieldErrors?.password} />
      <FormMessage message={state.message} />
      <Button type="submit" disabled={pending}>
        {pending ? "Creating…" : "Create account"}
      </Button>
    </form>
  );
}
