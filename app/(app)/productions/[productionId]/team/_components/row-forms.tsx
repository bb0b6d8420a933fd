"use client";

import { useActionState } from "react";
import { changeRoleAction, removeMemberAction, resendInvitationAction, withdrawInvitationAction } from "../actions";
import { IDLE, type ActionState } from "@/lib/http/action-state";
import { ROLE_LABELS, ROLES, type Role } from "@/lib/auth/roles";
import { Button } from "@/components/ui/button";

function Outcome({ state }: { state: ActionState<object> }) {
  if (state.status === "idle") return null;
  return (
    <span role="status" className={`text-xs ${state.status === "error" ? "text-danger" : "text-muted"}`}>
      {state.message}
    </span>
  );
}

export function RoleForm({
  productionId,
  memberId,
  role,
  version,
  name,
}: {
  productionId: number;
  memberId: number;
  role: Role;
  version: number;
  name: string;
}) {
  const [state, action, pending] = useActionState(changeRoleAction.bind(null, productionId), IDLE);
  return (
    <form action={action} className="flex flex-wrap items-center gap-2">
      <input type="hidden" name="memberId" value={memberId} />
      <input type="hidden" name="version" value={version} />
      <select
        name="role"
        defaultValue={role}
        aria-label={`Role of ${name}`}
        className="min-h-9 rounded-md border border-line bg-surface px-2 text-sm text-ink"
      >
        {ROLES.map((r) => (
          <option key={r} value={r}>
            {ROLE_LABELS[r]}
          </option>
        ))}
      </select>
      <Button type="submit" variant="secondary" disabled={pending} className="min-h-9 px-3">
        Change role
      </Button>
      <Outcome state={state} />
    </form>
  );
}

export function RemoveForm({ productionId, memberId, name }: { productionId: number; memberId: number; name: string }) {
  const [state, action, pending] = useActionState(removeMemberAction.bind(null, productionId), IDLE);
  return (
    <form
      action={action}
      onSubmit={(e) => {
        if (!window.confirm(`Remove ${name} from this production's team?`)) e.preventDefault();
      }}
      className="flex items-center gap-2"
    >
      <input type="hidden" name="memberId" value={memberId} />
      <Button type="submit" variant="quiet" disabled={pending} className="min-h-9 px-2" aria-label={`Remove ${name}`}>
        Remove
      </Button>
      <Outcome state={state} />
    </form>
  );
}

export function InvitationForms({
  productionId,
  invitationId,
  email,
}: {
  productionId: number;
  invitationId: number;
  email: string;
}) {
  const [resent, resend, resending] = useActionState(resendInvitationAction.bind(null, productionId), IDLE);
  const [withdrawn, withdraw, withdrawing] = useActionState(withdrawInvitationAction.bind(null, productionId), IDLE);
  return (
    <div className="flex flex-wrap items-center gap-2">
      <form action={resend}>
        <input type="hidden" name="invitationId" value={invitationId} />
        <Button
          type="submit"
          variant="secondary"
          disabled={resending}
          className="min-h-9 px-3"
          // The visible words come first in the spoken name (WCAG 2.5.3, label in name).
          aria-label={`Send again: the invitation to ${email}`}
        >
          Send again
        </Button>
      </form>
      <form action={withdraw}>
        <input type="hidden" name="invitationId" value={invitationId} />
        <Button
          type="submit"
          variant="quiet"
          disabled={withdrawing}
          className="min-h-9 px-2"
          aria-label={`Withdraw the invitation to ${email}`}
        >
          Withdraw
        </Button>
      </form>
      <Outcome state={resent.status !== "idle" ? resent : withdrawn} />
    </div>
  );
}
