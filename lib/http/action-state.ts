// What a server action built with formAction/memberAction (lib/auth/member-action.ts) answers a
// form with. Types and readers only, so client components import this file, never the wrapper.
import type { FieldErrors } from "@/lib/errors";

export type ActionError = {
  status: "error";
  message: string;
  fieldErrors: FieldErrors;
  /** What the user typed, echoed back so a refused form keeps it. */
  values: Record<string, string>;
  /** On a 409: the row as it is now. */
  current?: unknown;
};

/** The state a form starts in, before its first submit. */
export type ActionIdle = { status: "idle" };
export type ActionOk<T extends object> = { status: "ok"; message?: string } & T;
export type ActionState<T extends object = object> = ActionIdle | ActionOk<T> | ActionError;

export const IDLE: ActionIdle = { status: "idle" };

/** The messages for one field, for the field's `error` prop (undefined unless the last submit was refused). */
export function fieldError(state: ActionState<object>, field: string): string[] | undefined {
  return state.status === "error" ? state.fieldErrors[field] : undefined;
}

/** What the user typed into `field` on a refused submit, if anything. */
export function typedValue(state: ActionState<object>, field: string): string | undefined {
  return state.status === "error" ? state.values[field] : undefined;
}
