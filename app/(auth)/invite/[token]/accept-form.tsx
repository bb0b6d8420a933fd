"use client";

import { useActionState } from "react";
import { acceptAsNewAccountAction, acceptSignedInAction } from "../actions";
import { fieldError, IDLE, typedValue } from "@/lib/http/action-state";
import { TextField } from "@/components/ui/text-field";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

type Mode = { kind: "new"; email: string } | { kind: "signed-in"; name: string; email: string };

export function AcceptForm({ token, mode }: { token: string; mode: Mode }) {
  const [state, action, pending] = useActionState(
    mode.kind === "new" ? acceptAsNewAccountAction : acceptSignedInAction,
    IDLE,
  );
  return (
    <form action={action} className="flex flex-col gap-3" noValidate>
      <input type="hidden" name="token" value={token} />
      {mode.kind === "new" ? (
        <>
          <p className="text-sm text-muted">Your account will use {mode.email}.</p>
          <TextField
            label="Your name"
            name="name"
            autoComplete="name"
            required
            defaultValue={typedValue(state, "name")}
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
        </>
      ) : (
        <p className="text-sm">
          You are signed in as {mode.name} ({mode.email}); this account will join.
        </p>
      )}
      <FormMessage message={state.status === "error" ? state.message : undefined} />
      <Button type="submit" disabled={pending}>
        {pending ? "Joining…" : mode.kind === "new" ? "Create account and join" : "Join the production"}
      </Button>
    </form>
  );
}
