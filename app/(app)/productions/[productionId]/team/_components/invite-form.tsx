"use client";

import { useActionState } from "react";
import { inviteAction } from "../actions";
import { fieldError, IDLE, typedValue } from "@/lib/http/action-state";
import { ROLE_LABELS, ROLES } from "@/lib/auth/roles";
import { TextField } from "@/components/ui/text-field";
import { Button } from "@/components/ui/button";
import { FormMessage } from "@/components/ui/form-message";

export function InviteForm({ productionId }: { productionId: number }) {
  const [state, action, pending] = useActionState(inviteAction.bind(null, productionId), IDLE);
  const roleError = fieldError(state, "role");
  return (
    <form action={action} className="flex flex-wrap items-end gap-3" noValidate aria-label="Invite someone">
      <TextField
        label="E-mail"
        name="email"
        type="email"
        required
        className="min-w-56 flex-1"
        defaultValue={typedValue(state, "email")}
        error={fieldError(state, "email")}
      />
      <div className="flex flex-col gap-1 text-sm">
        {/* A label of its own (not wrapping the select): a wrapping label's name would include the chosen option. */}
        <label htmlFor="invite-role" className="font-medium">
          Role
        </label>
        <select
          id="invite-role"
          name="role"
          defaultValue={typedValue(state, "role") ?? "viewer"}
          aria-invalid={roleError ? true : undefined}
          className="min-h-10 rounded-md border border-line bg-surface px-3 text-ink"
        >
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {ROLE_LABELS[r]}
            </option>
          ))}
        </select>
      </div>
      <Button type="submit" disabled={pending}>
        {pending ? "Sending…" : "Send invitation"}
      </Button>
      <div className="basis-full" role="status" aria-live="polite">
        {state.status === "ok" ? <p className="text-sm">{state.message}</p> : null}
        <FormMessage message={state.status === "error" ? state.message : undefined} />
      </div>
    </form>
  );
}
